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
  page.on('console', (msg) => {
    if (msg.type() === 'error') consoleErrors.push(`${msg.text()} @ ${page.url()}`);
  });
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
  /**
   * Runs `fn`, then drops the console errors it caused that match `pattern` (a 401 a step expects,
   * which Chromium logs as a failed resource), so only unexpected errors fail the run.
   */
  const expectingConsoleErrors = async (pattern, fn) => {
    const before = consoleErrors.length;
    await fn();
    const during = consoleErrors.splice(before);
    consoleErrors.push(...during.filter((e) => !pattern.test(e)));
  };
  return { page, server, consoleErrors, shot, go, signIn, signOut, expectingConsoleErrors };
}

/**
 * What is wrong with the page's structure, as a list of sentences (empty when nothing is):
 * headings must start at one h1 and never skip a level; no table may run off the screen or cut its
 * cells, and a table wider than its place must scroll inside a labelled, focusable region.
 * @param {import('playwright-core').Page} page
 */
export function pageProblems(page) {
  return page.evaluate(() => {
    const problems = [];
    const visible = (el) => el.getClientRects().length > 0 && getComputedStyle(el).visibility !== 'hidden';
    const headings = [...document.querySelectorAll('h1, h2, h3, h4, h5, h6')].filter(
      (h) => visible(h) && !h.closest('[aria-hidden="true"]'),
    );
    const levels = headings.map((h) => Number(h.tagName[1]));
    if (levels.filter((l) => l === 1).length !== 1)
      problems.push(`${levels.filter((l) => l === 1).length} h1 headings (want exactly one)`);
    if (levels[0] !== 1) problems.push(`the first heading is h${levels[0]}, not h1`);
    levels.forEach((level, i) => {
      if (i > 0 && level > levels[i - 1] + 1)
        problems.push(
          `h${levels[i - 1]} "${headings[i - 1].textContent.trim().slice(0, 40)}" is followed by h${level} "${headings[i].textContent.trim().slice(0, 40)}"`,
        );
    });
    const width = document.documentElement.clientWidth;
    if (document.documentElement.scrollWidth > width + 1)
      problems.push(`the page scrolls sideways (${document.documentElement.scrollWidth} px for ${width})`);
    for (const table of document.querySelectorAll('table, [role="grid"], [role="table"]')) {
      if (!visible(table)) continue;
      const name = table.getAttribute('aria-label') ?? table.tagName;
      let scroller = null;
      for (let a = table.parentElement; a && a !== document.body; a = a.parentElement) {
        const overflow = getComputedStyle(a).overflowX;
        if (overflow === 'auto' || overflow === 'scroll') {
          scroller = a;
          break;
        }
        if ((overflow === 'hidden' || overflow === 'clip') && a.scrollWidth > a.clientWidth + 1) {
          problems.push(`table "${name}" is cut off by a container that hides overflow`);
          break;
        }
      }
      const box = (scroller ?? table).getBoundingClientRect();
      if (box.right > width + 1)
        problems.push(`table "${name}" runs off the screen (right edge ${Math.round(box.right)})`);
      if (scroller && scroller.scrollWidth > scroller.clientWidth + 1) {
        if (scroller.getAttribute('role') !== 'region' || !scroller.getAttribute('aria-label'))
          problems.push(`table "${name}" scrolls sideways in a region with no role or name`);
        if (scroller.tabIndex < 0)
          problems.push(`table "${name}" scrolls sideways in a region the keyboard cannot reach`);
      }
      for (const cell of table.querySelectorAll('td, th, [role="gridcell"], [role="columnheader"]')) {
        const style = getComputedStyle(cell);
        if (
          (style.overflowX === 'hidden' || style.overflowX === 'clip') &&
          cell.scrollWidth > cell.clientWidth + 1
        ) {
          problems.push(`a cell of "${name}" cuts its content: "${cell.textContent.trim().slice(0, 30)}"`);
          break;
        }
      }
    }
    return problems;
  });
}
