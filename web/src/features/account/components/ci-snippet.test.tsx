import { describe, expect, it } from 'vitest';
import { ciSnippet } from './ci-snippet';

describe('ciSnippet', () => {
  const text = ciSnippet({ serverUrl: 'https://ligament.example.test', projectId: 7 });

  it('installs the package from the tarball kept in the repository: it is not on the npm registry', () => {
    expect(text.split('\n')).toContain('npm install --no-save ./tools/ligament-0.1.0.tgz');
  });

  it('gives the check and submit commands for the project with the glob quoted for the CLI to expand', () => {
    expect(text).toContain(
      "npx ligament check --format sarif --fail-on overstated 'calc/**/*.json' > ligament.sarif",
    );
    expect(text).toContain(
      `npx ligament submit --server https://ligament.example.test --token "$LIGAMENT_TOKEN" --project 7 'calc/**/*.json'`,
    );
  });

  it('reads the token from the CI secret variable and never holds a secret', () => {
    expect(text).toContain('"$LIGAMENT_TOKEN"');
    expect(text).not.toMatch(/lgt_/);
    // Every glob is quoted: no bare calc/** left for the shell.
    expect(text.match(/calc\/\*\*\/\*\.json/g)?.length).toBe(text.match(/'calc\/\*\*\/\*\.json'/g)?.length);
  });
});
