// What every journey of the browser run shares: the demo people, the page's console watch, and the
// moves a user makes (sign in and out, navigate, take a screenshot). Each helper waits on what the
// screen shows, never on time, so a slow machine only makes the run slower, not red.
import { join } from 'node:path';
import { artifacts, webRoot } from './harness.mjs';

export const PASSWORD = 'lantern-demo-2026';
export const PEOPLE = {
  checker: 'tomasz@larchmont-review.example.test',
  consultant: 'priya@fennick-ode.example.test',
  ownerRep: 'adaeze@tidewater-crossing.example.test',
  admin: 'sam@tidewater-crossing.example.test',
};

/** A calc file kept for the browser run in `web/e2e/fixtures/`. */
export const fixture = (name) => join(webRoot, 'e2e', 'fixtures', name);

/** Throws with `message` unless `condition` holds. */
export const expect = (condition, message) => {
  if (!condition) throw new Error(message);
};

/**
 * The helpers a journey drives the page with.
 * @param {import('playwright-core').Page} page
 * @param {{ baseUrl: string }} server
 */
export function createSession(page, server) {
  const consoleErrors = [];
  /** Console errors a step provokes on purpose (a refused request the browser logs), each allowed once. */
  const expected = [];
  page.on('console', (msg) => {
    if (msg.type() !== 'error') return;
    const i = expected.findIndex((pattern) => pattern.test(msg.text()));
    if (i >= 0) expected.splice(i, 1);
    else consoleErrors.push(`${msg.text()} @ ${page.url()}`);
  });
  /**
   * The next console error matching `pattern` is expected (e.g. the browser's own line for a request
   * the service refuses on purpose) and does not fail the run.
   */
  const expectConsoleError = (pattern) => {
    expected.push(pattern);
  };
  page.on('pageerror', (error) => consoleErrors.push(`page error: ${error.message} @ ${page.url()}`));

  /** A full-page screenshot in e2e/artifacts/, once the fonts are in and no animation is running. */
  const shot = async (name) => {
    await page.evaluate(() => document.fonts.ready);
    await page.evaluate(
      () =>
        new Promise((resolve) =>
          requestAnimationFrame(() => requestAnimationFrame(() => resolve(undefined))),
        ),
    );
    await page.screenshot({ path: join(artifacts, `${name}.png`), fullPage: true, animations: 'disabled' });
  };
  /** Client-side navigation, as a link in the app would do it. */
  const go = async (path) => {
    await page.evaluate((p) => {
      window.history.pushState({}, '', p);
      window.dispatchEvent(new PopStateEvent('popstate'));
    }, path);
  };
  const signIn = async (email, redirectTo) => {
    await page.goto(
      `${server.baseUrl}/sign-in${redirectTo ? `?redirectTo=${encodeURIComponent(redirectTo)}` : ''}`,
    );
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(PASSWORD);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('button', { name: /Account menu for/ }).waitFor();
  };
  const signOut = async () => {
    await page.getByRole('button', { name: /Account menu for/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
  };
  return { page, server, consoleErrors, expectConsoleError, shot, go, signIn, signOut };
}
