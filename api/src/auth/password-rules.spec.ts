import { passwordProblem } from './password-rules.js';

describe('passwordProblem', () => {
  it('refuses common passwords, also with digits and symbols around them and in any case', () => {
    for (const p of ['1234567890', 'qwertyuiop', 'Password2026!', '!!Welcome123', 'FOOTBALL1234'])
      expect(passwordProblem(p, [])).toMatch(/^is one of the most common passwords/);
  });

  it('refuses repetition and key or letter runs', () => {
    expect(passwordProblem('aaaaaaaaaaaa', [])).toMatch(/^repeats too few different characters/);
    expect(passwordProblem('abababababab', [])).toMatch(/^repeats too few different characters/);
    expect(passwordProblem('lmnopqrstuvw', [])).toMatch(/^is a run of keys or letters/);
    expect(passwordProblem('wvutsrqponml', [])).toMatch(/^is a run of keys or letters/);
  });

  it('refuses the account’s own words and the service name', () => {
    const context = ['noor@larchmont-review.example.test', 'noor', 'Noor Castellan', 'Noor', 'Castellan'];
    expect(passwordProblem('castellan-2026-x', context)).toMatch(/^contains your e-mail/);
    expect(passwordProblem('my-ligament-key', [])).toMatch(/^contains your e-mail/);
    expect(passwordProblem('lantern-demo-2026', [])).toMatch(/^contains your e-mail/);
  });

  it('accepts a long passphrase of ordinary words', () => {
    expect(passwordProblem('heron gusset plate forty-one', ['noor', 'Noor Castellan'])).toBeNull();
    expect(passwordProblem('Tidal-bolt-7-spanner', [])).toBeNull();
  });
});
