// The whole review loop, as the people on the demo project work it: an owner's rep notes the
// dashboard; a checker signs in, uploads three files (after the browser has refused a broken one),
// reads the discrepancies and makes a move; a consultant answers one and makes a CI token and
// answers another by linking a revision; the checker accepts, stamps and rechecks with the current
// engine and reads the project activity; the owner's rep sees the dashboard change. Then the same
// screens at tablet width, in the dark theme, for rolled shapes, and on wide screens.
import { join } from 'node:path';
import { artifacts, repoRoot } from '../harness.mjs';
import { PEOPLE, expect, fixture } from '../session.mjs';

/**
 * @param {{ runner: ReturnType<typeof import('../harness.mjs').createRunner>,
 *   session: ReturnType<typeof import('../session.mjs').createSession>,
 *   state: Record<string, unknown> }} ctx
 */
export default async function reviewLoop({ runner, session, state }) {
  const { page, server, shot, go, signIn, signOut } = session;
  const openCount = async () => Number((await page.getByTestId('kpi-open-value').textContent())?.trim());
  let openBefore = NaN;
  let projectId = NaN;
  let submittalId = NaN;

  await runner.step('sign-in page renders with the caution and demo accounts', async () => {
    await page.goto(`${server.baseUrl}/sign-in`);
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await page.getByText('Ligament is a checking aid.').first().waitFor();
    await page.getByRole('button', { name: 'Sign in as Tomasz Quell' }).waitFor();
    await shot('01-sign-in');
  });

  await runner.step("owner's rep sees the dashboard", async () => {
    await signIn(PEOPLE.ownerRep);
    await page.getByRole('heading', { name: 'Open discrepancies' }).waitFor();
    await page.getByTestId('kpi-open').waitFor();
    openBefore = await openCount();
    expect(Number.isFinite(openBefore), 'open count is a number');
    await shot('02-dashboard-before');
    await signOut();
  });

  await runner.step('checker signs in and sees the projects with open counts by class', async () => {
    await signIn(PEOPLE.checker);
    await page.getByRole('heading', { name: 'Your projects' }).waitFor();
    const card = page.getByTestId('project-card').filter({ hasText: 'Harbour Lantern Footbridge' });
    await card.getByRole('list', { name: 'Open findings by class' }).waitFor();
    await shot('03-projects');
    await card.getByRole('link', { name: 'Harbour Lantern Footbridge' }).click();
    await page.getByRole('heading', { name: 'Submittals and revisions' }).waitFor();
    projectId = Number(new URL(page.url()).pathname.split('/')[2]);
    await page.locator('.recharts-surface').first().waitFor();
    await shot('04-project-overview');
  });

  await runner.step('the browser refuses a broken calc file with line, column and pointer', async () => {
    await page.getByRole('button', { name: 'Upload calc files' }).click();
    await page.getByRole('heading', { name: 'Upload calc files' }).waitFor();
    await page.getByTestId('calc-file-input').setInputFiles(fixture('broken-anchor-plate.json'));
    const item = page.getByTestId('file-check').filter({ hasText: 'broken-anchor-plate.json' });
    await item.getByText(/error.* — fix before uploading/).waitFor();
    const text = await item.textContent();
    expect(
      /line \d+, column \d+ · \/members\/0/.test(text ?? ''),
      `errors name line, column and pointer: ${text}`,
    );
    await shot('05-upload-invalid');
    await item.getByRole('button', { name: 'Remove broken-anchor-plate.json' }).click();
  });

  await runner.step('checker uploads three files and reads the server summary', async () => {
    await page
      .getByTestId('calc-file-input')
      .setInputFiles([
        fixture('hanger-plates.json'),
        fixture('splice-plates.json'),
        fixture('gusset-g2.json'),
      ]);
    await page
      .getByText(/^Valid · /)
      .nth(2)
      .waitFor();
    await page.getByLabel('Submittal title').fill('Issue C — hangers, chord splice, mast gusset');
    await shot('06-upload-ready');
    await page.getByRole('button', { name: /Upload 3 files and check/ }).click();
    const summary = page.getByTestId('upload-summary');
    await summary.waitFor({ timeout: 30_000 });
    submittalId = Number(/Submittal #(\d+)/.exec((await summary.textContent()) ?? '')?.[1]);
    expect(Number.isInteger(submittalId), 'summary names the submittal');
    await shot('07-upload-summary');
  });

  await runner.step(
    'the submittal shows the drawing, chains, claims and findings; hovering a chain traces it',
    async () => {
      await page.getByRole('button', { name: 'Open the submittal' }).click();
      await page.getByRole('tab', { name: /splice-plates\.json/ }).click();
      await page.getByTestId('member-drawing').waitFor();
      await page
        .getByRole('table', { name: 'Claimed against recomputed' })
        .getByText(/overstated by/)
        .first()
        .waitFor();
      const row = page.getByRole('row', { name: /^Chain / }).first();
      await row.hover();
      await page.locator('[data-highlighted-chain]').waitFor();
      await shot('08-submittal-member');
    },
  );

  await runner.step('checker sees the discrepancies and waives one with a reason', async () => {
    await go(`/discrepancies?projectId=${projectId}&submittalId=${submittalId}`);
    await page.getByTestId('discrepancy-row').first().waitFor();
    await shot('09-discrepancies');
    const detailRow = page.getByTestId('discrepancy-row').filter({ hasText: 'Understated' }).first();
    await detailRow.getByRole('button', { name: /Open .* details/ }).click();
    const detail = page.getByTestId('discrepancy-detail');
    await detail.getByRole('button', { name: 'Waive' }).click();
    await detail
      .getByLabel('Why it is waived')
      .fill('Conservative claim on the mast gusset; no change needed.');
    await detail.getByRole('button', { name: /Waive: move to Waived/ }).click();
    await detail.getByText('Waived', { exact: true }).first().waitFor();
    await shot('10-discrepancy-waived');
  });

  await runner.step('the revision view of a seeded revision shows the calc-file diff', async () => {
    await go(`/projects/${projectId}`);
    const revision = page
      .getByRole('link', { name: /#\d+ .*/ })
      .filter({ hasText: /issue B/i })
      .first();
    await revision.click();
    await page.getByRole('tab', { name: /Changes from #/ }).click();
    await page
      .getByRole('region', { name: /Changes in/ })
      .first()
      .waitFor();
    await shot('11-revision-diff');
  });

  await runner.step('consultant answers a discrepancy and creates a CI token', async () => {
    await signOut();
    await signIn(
      PEOPLE.consultant,
      `/discrepancies?projectId=${projectId}&submittalId=${submittalId}&status=raised`,
    );
    const row = page.getByTestId('discrepancy-row').filter({ hasText: 'Overstated' }).first();
    await row.getByRole('button', { name: /Open .* details/ }).click();
    const detail = page.getByTestId('discrepancy-detail');
    await detail.getByRole('button', { name: 'Answer' }).click();
    await detail
      .getByLabel(/Your answer/)
      .fill('SP-1 An revised: the zigzag A1–B1–A2 governs; calc updated in issue D.');
    await detail.getByRole('button', { name: /Answer: move to Answered/ }).click();
    await detail.getByText('Answered', { exact: true }).first().waitFor();
    await shot('12-consultant-answered');

    // An answer that links the seeded revision (issue B) of issue A, with no note.
    await go(`/projects/${projectId}`);
    await page
      .getByRole('link', { name: /issue A/i })
      .first()
      .click();
    await page.getByRole('heading', { name: /issue A/i }).waitFor();
    const issueA = Number(new URL(page.url()).pathname.split('/').pop());
    expect(Number.isInteger(issueA), `issue A has an id (${page.url()})`);
    await go(`/discrepancies?projectId=${projectId}&submittalId=${issueA}&status=raised`);
    await page
      .getByTestId('discrepancy-row')
      .first()
      .getByRole('button', { name: /Open .* details/ })
      .click();
    const answer = page.getByTestId('discrepancy-detail');
    await answer.getByRole('button', { name: 'Answer' }).click();
    const revisionSelect = answer.getByLabel('Revision that answers it');
    const issueB = await revisionSelect.locator('option', { hasText: /issue B/i }).getAttribute('value');
    expect(issueB, 'issue B is offered as the revision of issue A');
    await revisionSelect.selectOption(String(issueB));
    await answer.getByRole('button', { name: /Answer: move to Answered/ }).click();
    await answer.getByText('Answered', { exact: true }).first().waitFor();
    await shot('12b-answered-with-revision');
    await answer.getByText(`moved to answered · revision #${issueB}`).waitFor();
    await go('/account');
    await page.getByLabel('Token name').fill('CI — harbour-lantern repository');
    await page.getByRole('button', { name: 'Create token' }).click();
    await page
      .getByTestId('new-token')
      .getByText(/npx ligament submit --server/)
      .waitFor();
    await shot('13-account-token');
  });

  await runner.step('checker accepts the answer and stamps the submittal', async () => {
    await signOut();
    await signIn(
      PEOPLE.checker,
      `/discrepancies?projectId=${projectId}&submittalId=${submittalId}&status=answered`,
    );
    const row = page.getByTestId('discrepancy-row').first();
    await row.getByRole('button', { name: /Open .* details/ }).click();
    const detail = page.getByTestId('discrepancy-detail');
    await detail.getByRole('button', { name: 'Accept' }).click();
    await detail.getByRole('button', { name: /Accept: move to Accepted/ }).click();
    await detail.getByText('Accepted', { exact: true }).first().waitFor();
    await go(`/submittals/${submittalId}`);
    await page.getByRole('button', { name: 'Stamp…' }).click();
    await page.getByRole('radio', { name: 'Revise and resubmit' }).check();
    await page
      .getByLabel('Comment to the consultant')
      .fill('Missed zigzag chain on SP-1; revise and resubmit.');
    const override = page.getByLabel('Reason for stamping with open errors');
    if (await override.count())
      await override.fill('Returned for revision; the open errors go back with the stamp.');
    await shot('14-stamp-dialog');
    await page.getByRole('button', { name: 'Stamp', exact: true }).click();
    await page.getByText(/Stamped: Revise and resubmit/).waitFor();
    await go(`/submittals/${submittalId}/report`);
    await page
      .getByRole('article', { name: 'Review report' })
      .getByText('Ligament is a checking aid.')
      .first()
      .waitFor();
    await shot('15-review-report');
  });

  await runner.step('checker rechecks the submittal and reads the project activity', async () => {
    await go(`/submittals/${submittalId}`);
    await page.getByRole('button', { name: /^Recheck with engine / }).click();
    const result = page.getByTestId('recheck-result');
    await result.waitFor();
    await result.getByText(/rechecked with engine/).waitFor();
    await shot('15b-recheck');
    await go(`/projects/${projectId}`);
    const log = page.getByTestId('activity-log');
    await log
      .getByText(new RegExp(`rechecked submittal #${submittalId} with engine`))
      .first()
      .waitFor();
    await log
      .getByText(/answered discrepancy #\d+ with revision #\d+/)
      .first()
      .waitFor();
    await log
      .getByText(new RegExp(`stamped submittal #${submittalId} “revise and resubmit”`))
      .first()
      .waitFor();
    await shot('15c-project-activity');
  });

  await runner.step("owner's rep sees the dashboard change", async () => {
    await signOut();
    await signIn(PEOPLE.ownerRep);
    await page.getByTestId('kpi-open').waitFor();
    const after = await openCount();
    expect(after !== openBefore, `open count changed (before ${openBefore}, after ${after})`);
    await shot('16-dashboard-after');
    await page.setViewportSize({ width: 820, height: 1100 });
    await shot('17-dashboard-tablet');
    await page.setViewportSize({ width: 1280, height: 860 });
  });

  await runner.step('admin sees users, invitations and projects; the demo mailbox has mail', async () => {
    await signOut();
    await signIn(PEOPLE.admin, '/admin');
    await page.getByRole('table', { name: 'Users' }).waitFor();
    await shot('18-admin-users');
    await page.getByRole('tab', { name: 'Invitations' }).click();
    await page.getByRole('form', { name: 'Invite someone' }).waitFor();
    await page
      .getByRole('table', { name: 'Invitations' })
      .or(page.getByText('No invitations sent'))
      .waitFor();
    await shot('18b-admin-invitations');
    await page.getByRole('tab', { name: 'Projects and members' }).click();
    await page.getByRole('table', { name: 'Project members' }).waitFor();
    await shot('19-admin-projects');
    await go('/mailbox');
    await page.getByRole('heading', { name: 'Demo mailbox' }).waitFor();
    await page.getByRole('heading', { name: /messages/ }).waitFor();
    await shot('20-mailbox');
  });

  await runner.step('discrepancies at tablet width', async () => {
    await page.setViewportSize({ width: 820, height: 1100 });
    await go(`/discrepancies?projectId=${projectId}`);
    await page.getByTestId('discrepancy-row').first().waitFor();
    await shot('21-discrepancies-tablet');
  });

  await runner.step('the dark theme keeps the drawing and the chart readable', async () => {
    await page.setViewportSize({ width: 1280, height: 860 });
    await page.getByRole('button', { name: 'Use the dark theme' }).click();
    await go(`/submittals/${submittalId}`);
    await page.getByRole('tab', { name: /splice-plates\.json/ }).click();
    await page.getByTestId('member-drawing').waitFor();
    await shot('22-submittal-dark');
    await go(`/projects/${projectId}`);
    await page.locator('.recharts-surface').first().waitFor();
    await shot('23-project-dark');
  });

  await runner.step('rolled-shape members are drawn unfolded with their strips and junctions', async () => {
    await signOut();
    await signIn(PEOPLE.checker, `/projects/${projectId}/upload`);
    const example = (name) => join(repoRoot, 'schema', 'examples', name);
    await page
      .getByTestId('calc-file-input')
      .setInputFiles([example('lantern-hanger-wt.json'), example('lantern-brace-angle.json')]);
    await page
      .getByText(/^Valid · /)
      .nth(1)
      .waitFor();
    await page.getByLabel('Submittal title').fill('Issue E — tee and W hangers, angle braces');
    await page.getByRole('button', { name: /Upload 2 files and check/ }).click();
    await page.getByTestId('upload-summary').waitFor({ timeout: 30_000 });
    await page.getByRole('button', { name: 'Open the submittal' }).click();
    const drawing = page.getByTestId('member-drawing');
    await page.getByRole('tab', { name: /lantern-hanger-wt\.json/ }).click();
    await drawing.getByText(/^stem · t = /).waitFor();
    await shot('24-member-tee');
    await page.getByRole('tab', { name: 'H-W1' }).click();
    await drawing.getByText(/^web · t = /).waitFor();
    await shot('25-member-w');
    await page.getByRole('tab', { name: /lantern-brace-angle\.json/ }).click();
    await drawing.getByText(/^leg-a · t = /).waitFor();
    await shot('26-member-angle');
  });

  await runner.step('at 1440 and 1920 px the discrepancy list and its detail sit side by side', async () => {
    // Still the checker from the step before; back to the light theme the screenshots are compared in.
    const light = page.getByRole('button', { name: 'Use the light theme' });
    if (await light.count()) await light.click();
    for (const [width, height] of [
      [1440, 900],
      [1920, 1080],
    ]) {
      await page.setViewportSize({ width, height });
      await go(`/discrepancies?projectId=${projectId}`);
      await page
        .getByTestId('discrepancy-row')
        .first()
        .getByRole('button', { name: /Open .* details/ })
        .click();
      const aside = page.getByRole('complementary', { name: 'Discrepancy details' });
      await aside.getByTestId('discrepancy-detail').waitFor();
      const list = await page.getByRole('grid', { name: 'Discrepancies' }).boundingBox();
      const detail = await aside.boundingBox();
      expect(list && detail, `both regions have boxes at ${width} px`);
      const gap = detail.x - (list.x + list.width);
      expect(gap > 0, `the detail starts right of the list at ${width} px (gap ${gap})`);
      expect(
        detail.y < list.y + list.height && list.y < detail.y + detail.height,
        `the two share the same rows of the screen at ${width} px`,
      );
      expect(detail.x + detail.width <= width, `the detail is not clipped at the right at ${width} px`);
      const scrollWidth = await page.evaluate(() => document.documentElement.scrollWidth);
      expect(scrollWidth <= width, `no sideways scroll at ${width} px (${scrollWidth})`);
      // The page margins do not swallow a wide screen: list and detail fill nine tenths of it.
      expect(
        detail.x + detail.width - list.x > 0.9 * width - 80,
        `the workspace uses the width at ${width} px`,
      );
      await page.mouse.move(1, 1);
      await page.screenshot({ path: join(artifacts, `27-discrepancies-${width}.png`) });
      // Scrolled down the long list, the detail stays in view.
      await page.mouse.wheel(0, 900);
      await page.waitForFunction(() => window.scrollY > 0);
      const stuck = await aside.boundingBox();
      expect(
        stuck && stuck.y >= 0 && stuck.y < 40,
        `the detail stays at the top while the list scrolls (${stuck?.y})`,
      );
      await page.evaluate(() => window.scrollTo(0, 0));
    }
    await page.setViewportSize({ width: 1280, height: 860 });
  });

  Object.assign(state, { projectId, submittalId });
}
