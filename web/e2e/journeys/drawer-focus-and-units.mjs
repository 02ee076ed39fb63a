// The narrow-screen discrepancy drawer and the units of its numbers (issues 10.10 and 12.3): at 390 px
// the detail opens in a modal drawer that must take the focus and stay reachable (it once stayed
// aria-hidden when it opened before the detail had loaded), and claimed and recomputed carry their
// file's unit. Runs after the review loop, as the checker it leaves signed in, on its submittal.
import { expect } from '../session.mjs';

/**
 * @param {{ runner: ReturnType<typeof import('../harness.mjs').createRunner>,
 *   session: ReturnType<typeof import('../session.mjs').createSession>,
 *   state: { projectId?: number, submittalId?: number } }} ctx
 */
export default async function drawerFocusAndUnits({ runner, session, state }) {
  const { page, server, shot } = session;

  await runner.step(
    'at 390 px the discrepancy drawer takes the focus and writes numbers with units',
    async () => {
      await page.setViewportSize({ width: 390, height: 844 });
      // A fresh page load (the session survives it): the detail the step before left open in the
      // wide layout would otherwise reopen here as the drawer (the list keeps its open row across
      // navigations within the page).
      await page.goto(
        `${server.baseUrl}/discrepancies?projectId=${state.projectId}&submittalId=${state.submittalId}&code=LG101&status=`,
      );
      const row = page.getByTestId('discrepancy-row').filter({ hasText: 'SP-1' }).first();
      await row.getByRole('button', { name: /Open LG101 .* details/ }).click();
      // By role: a drawer left aria-hidden would never be found, whatever the wait.
      const drawer = page.getByRole('dialog', { name: 'Discrepancy details' });
      const detail = drawer.getByTestId('discrepancy-detail');
      await detail.getByText('Claimed · recomputed').waitFor();
      await page.waitForFunction(() => {
        const dialog = document.querySelector('[role="dialog"]');
        return dialog !== null && dialog.contains(document.activeElement);
      });
      const values = await detail
        .getByText('Claimed · recomputed')
        .locator('xpath=following-sibling::*[1]')
        .textContent();
      expect(
        /^\d+\.\d{3} in² · \d+\.\d{3} in²$/.test(values ?? ''),
        `claimed and recomputed carry in² to 0.001 in² (${values})`,
      );
      const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(scrollWidth <= 390, `no sideways scroll at 390 px (${scrollWidth})`);
      await shot('28-discrepancy-drawer-390');
      await drawer.getByRole('button', { name: 'Close the details' }).click();
      await drawer.waitFor({ state: 'detached' });
    },
  );
  // Whatever happened above, the journeys after this one start at desktop width.
  await page.setViewportSize({ width: 1280, height: 860 });
}
