import { describe, expect, it } from 'vitest';
import { ciSnippet } from './ci-snippet';

describe('ciSnippet', () => {
  it('gives the exact check and submit commands for the project, with the new token', () => {
    const text = ciSnippet({ serverUrl: 'https://ligament.example.test', projectId: 7, token: 'lgt_abc' });
    expect(text).toContain(
      'npx ligament check --format sarif --fail-on overstated calc/**/*.json > ligament.sarif',
    );
    expect(text).toContain(
      'npx ligament submit --server https://ligament.example.test --token lgt_abc --project 7 calc/**/*.json',
    );
  });

  it('refers to a CI secret when the token is not on screen', () => {
    expect(ciSnippet({ serverUrl: 'https://ligament.example.test', projectId: 7 })).toContain(
      '--token "$LIGAMENT_TOKEN"',
    );
  });
});
