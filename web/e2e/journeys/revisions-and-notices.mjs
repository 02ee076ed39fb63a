// The review as people work it across revisions: the owner's rep reads the dashboard (first trend
// point labelled, numbers under their headers); the checker uploads a revision that fixes the chord
// splice and sees its items resolved and the counts drop, filters the list by submittal and text,
// opens rows with Enter, finds bulk moves offered only where every row allows them, reopens and
// assigns an item, exports the list as CSV and loses a race told in words; the consultant reads the
// notifications, answers the reopened item and turns a kind of mail off; the checker is told of the
// answer; the admin finds the mail in the demo mailbox. Runs after the review loop (its project and
// issue C are in `state`).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { artifacts } from '../harness.mjs';
import { PASSWORD, PEOPLE, expect, fixture } from '../session.mjs';

/**
 * @param {{ runner: ReturnType<typeof import('../harness.mjs').createRunner>,
 *   session: ReturnType<typeof import('../session.mjs').createSession>,
 *   state: Record<string, unknown> }} ctx
 */
export default async function revisionsAndNotices({ runner, session, state }) {
  const { page, server, shot, go, signIn, signOut, expectingConsoleErrors } = session;
  const projectId = Number(state.projectId);
  const issueC = Number(state.submittalId);
  const openKpi = async () => Number((await page.getByTestId('kpi-open-value').textContent())?.trim());
  const listTotal = async () => {
    const text = await page.getByText(/^\d+ discrepanc(y|ies) · page/).textContent();
    return Number(/^(\d+)/.exec(text ?? '')?.[1]);
  };
  const drawer = () => page.getByRole('dialog', { name: 'Discrepancy details' });
  /** Waits until the list shows the rows of `search` (the address), not those of the page before. */
  const listShows = (search) =>
    page.waitForFunction(
      (s) => document.querySelector('[data-testid="discrepancy-list"]')?.getAttribute('data-search') === s,
      search,
    );
  /** Waits until the list shows the rows of the address it is at (after a filter changed it). */
  const listSettled = () =>
    page.waitForFunction(
      () =>
        document.querySelector('[data-testid="discrepancy-list"]')?.getAttribute('data-search') ===
        window.location.search,
    );
  /** Opens the discrepancy list at `search` and waits for its rows. */
  const goList = async (search) => {
    await go(`/discrepancies${search}`);
    await listShows(search);
  };
  const closeDrawer = async () => {
    await drawer().getByRole('button', { name: 'Close the details' }).click();
    await drawer().waitFor({ state: 'detached' });
  };
  const drawerId = async () =>
    Number(
      /#(\d+)/.exec(
        (await drawer()
          .getByText(/^Discrepancy #\d+$/)
          .textContent()) ?? '',
      )?.[1],
    );
  /** The service as another client would call it (a colleague's browser, the outbox worker). */
  const api = async (email, method, path, body) => {
    const login = await fetch(`${server.baseUrl}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password: PASSWORD }),
    });
    const { accessToken } = await login.json();
    const res = await fetch(`${server.baseUrl}${path}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}`, 'Content-Type': 'application/json' },
      body: body ? JSON.stringify(body) : undefined,
    });
    return { status: res.status, body: await res.json().catch(() => null) };
  };
  let openBefore = NaN;
  let issueD = NaN;
  let reopenedId = NaN;

  await runner.step(
    "owner's rep: the trend labels its first point; the project numbers sit under their headers",
    async () => {
      // The journey before may leave a discrepancy open (a modal drawer at this width): leave the page.
      await go('/projects');
      await page.getByRole('heading', { name: 'Your projects' }).waitFor();
      await signOut();
      await signIn(PEOPLE.ownerRep);
      await page
        .getByTestId('kpi-open')
        .getByText(/later revisions not counted/)
        .waitFor();
      openBefore = await openKpi();
      const ticks = page.locator('.recharts-xAxis-tick-labels .recharts-cartesian-axis-tick-value');
      await ticks.first().waitFor();
      const first = await ticks.first().textContent();
      expect(/^#1 · /.test(first ?? ''), `the first trend point is labelled (${first})`);
      const chart = await page.getByRole('img', { name: /^Submittal 1: / }).boundingBox();
      const firstBox = await ticks.first().boundingBox();
      expect(chart && firstBox && firstBox.x >= chart.x, 'the first label is inside the chart');
      const misaligned = await page.evaluate(() => {
        const table = document.querySelector('table[aria-label="Open discrepancies by project"]');
        const right = (el) => {
          const range = document.createRange();
          range.selectNodeContents(el);
          return range.getBoundingClientRect().right;
        };
        const heads = [...(table?.querySelectorAll('thead th') ?? [])];
        const cells = [...(table?.querySelectorAll('tbody tr:first-child td') ?? [])];
        return [1, 2, 3]
          .map((i) => ({ i, gap: Math.abs(right(heads[i]) - right(cells[i])) }))
          .filter((c) => !(c.gap <= 4));
      });
      expect(misaligned.length === 0, `every number ends under its header: ${JSON.stringify(misaligned)}`);
      await shot('30-dashboard-trend-and-table');
    },
  );

  await runner.step(
    'checker: a revision that fixes the chord splice resolves its items; the counts drop',
    async () => {
      await signOut();
      await signIn(
        PEOPLE.checker,
        `/discrepancies?projectId=${projectId}&submittalId=${issueC}&memberId=SP-1`,
      );
      await listShows(`?projectId=${projectId}&submittalId=${issueC}&memberId=SP-1`);
      await page.getByTestId('discrepancy-row').first().waitFor();
      const spliceOpen = await listTotal();
      expect(spliceOpen > 0, `issue C has open chord splice items (${spliceOpen})`);
      await go(`/projects/${projectId}/upload`);
      await page.getByTestId('calc-file-input').setInputFiles(fixture('splice-plates-issue-d.json'));
      await page.getByText(/^Valid · /).waitFor();
      await page.getByLabel('Submittal title').fill('Issue D — chord splice with the zigzag chain');
      await page.getByRole('combobox', { name: 'Revision of' }).click();
      await page.getByRole('option', { name: new RegExp(`^#${issueC} `) }).click();
      await page.getByRole('button', { name: /Upload 1 file and check/ }).click();
      const summary = page.getByTestId('upload-summary');
      await summary.waitFor({ timeout: 30_000 });
      issueD = Number(/Submittal #(\d+)/.exec((await summary.textContent()) ?? '')?.[1]);
      expect(Number.isInteger(issueD), 'the revision has a number');

      await goList(`?projectId=${projectId}&submittalId=${issueC}&memberId=SP-1&status=`);
      await page.getByText('Nothing matches these filters').waitFor();
      await page.getByRole('switch', { name: 'Show superseded items' }).click();
      const resolved = page.getByTestId('discrepancy-row').filter({ hasText: 'Resolved' });
      await resolved.first().getByText(`by #${issueD}`).waitFor();
      expect((await resolved.count()) >= spliceOpen, 'every open chord splice item of issue C is resolved');
      await shot('31-superseded-shown');
      await go('/dashboard');
      await page.getByTestId('kpi-open').waitFor();
      await page
        .getByTestId('kpi-open')
        .getByText(String(openBefore - spliceOpen), { exact: true })
        .waitFor();
      await shot('32-dashboard-after-revision');
    },
  );

  await runner.step(
    'checker: the list filters by submittal and by free text, with a submittal column',
    async () => {
      await goList(`?projectId=${projectId}`);
      await page.getByRole('columnheader', { name: /Submittal/ }).waitFor();
      await page.getByRole('combobox', { name: 'Submittal' }).click();
      await page.getByRole('option', { name: /^#1 / }).click();
      await page.waitForFunction(() => new URL(window.location.href).searchParams.get('submittalId') === '1');
      await listSettled();
      const rows = page.getByTestId('discrepancy-row');
      const submittals = await rows.evaluateAll((els) =>
        els.map((el) => el.querySelectorAll('[role="gridcell"]')[5]?.textContent?.trim()),
      );
      expect(submittals.length > 0 && submittals.every((s) => s === '#1'), `only #1 rows: ${submittals}`);
      await page.getByRole('searchbox').fill('H-1');
      await page.waitForFunction(() => new URL(window.location.href).searchParams.get('q') === 'H-1');
      await listSettled();
      const members = await rows.evaluateAll((els) => els.map((el) => el.textContent ?? ''));
      expect(
        members.length > 0 && members.every((t) => t.includes('H-1')),
        `only H-1 rows (${members.length})`,
      );
      await shot('33-search-and-submittal-filter');
      await page.getByRole('button', { name: 'Clear filters' }).click();
    },
  );

  await runner.step('checker: Enter opens the focused row, arrow keys move to the next', async () => {
    await goList(`?projectId=${projectId}&status=open`);
    const rows = page.getByTestId('discrepancy-row');
    await rows.nth(1).waitFor();
    const codeOf = async (i) =>
      (
        await rows
          .nth(i)
          .getByRole('button', { name: /^Open / })
          .textContent()
      )?.trim();
    await rows.first().getByRole('gridcell').last().focus();
    await page.keyboard.press('Enter');
    await drawer()
      .getByTestId('discrepancy-detail')
      .getByText(await codeOf(0), { exact: true })
      .waitFor();
    // The drawer keeps its content readable (a modal that lost focus would hide it from the page's roles).
    await drawer().getByRole('button', { name: 'Waive' }).waitFor();
    await shot('34-enter-opens');
    await drawer().getByRole('button', { name: 'Close the details' }).click();
    await drawer().waitFor({ state: 'detached' });
    await rows.first().getByRole('gridcell').last().focus();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press('Enter');
    await drawer()
      .getByTestId('discrepancy-detail')
      .getByText(await codeOf(1), { exact: true })
      .waitFor();
    await page.keyboard.press('Escape');
    await drawer().waitFor({ state: 'detached' });
  });

  await runner.step('checker: bulk moves are offered only when every selected row allows them', async () => {
    await goList(`?projectId=${projectId}&status=raised,answered&sort=status`);
    const rowIn = (status) =>
      page
        .getByTestId('discrepancy-row')
        .filter({ has: page.getByText(status, { exact: true }) })
        .first();
    const answered = rowIn('Answered');
    const raised = rowIn('Raised');
    await answered.waitFor();
    await answered.getByRole('checkbox').check();
    await raised.getByRole('checkbox').check();
    const bar = page.getByRole('region', { name: 'Move the selected discrepancies' });
    await bar.getByText('2 selected', { exact: true }).waitFor();
    expect(
      await bar.getByRole('button', { name: 'Accept 2' }).isDisabled(),
      'accept is not offered for a raised row',
    );
    expect(
      await bar.getByRole('button', { name: 'Return 2' }).isDisabled(),
      'return is not offered for a raised row',
    );
    expect(await bar.getByRole('button', { name: 'Waive 2' }).isEnabled(), 'waive is offered for both');
    await bar.getByText('Accept: 1 of 2 selected is not answered.').waitFor();
    await shot('35-bulk-only-where-allowed');
    await bar.getByRole('button', { name: 'Keep the 1 that can be moved' }).first().click();
    await bar.getByText('1 selected', { exact: true }).waitFor();
    expect(
      await bar.getByRole('button', { name: 'Accept 1' }).isEnabled(),
      'accept is offered for the answered row',
    );
    await answered.getByRole('checkbox').uncheck();
    await bar.waitFor({ state: 'detached' });
  });

  await runner.step(
    'checker: reopens an accepted item with a note, and assigns it with a due date',
    async () => {
      await goList(`?projectId=${projectId}&status=accepted`);
      await page
        .getByTestId('discrepancy-row')
        .first()
        .getByRole('button', { name: /^Open / })
        .click();
      const detail = drawer().getByTestId('discrepancy-detail');
      reopenedId = await drawerId();
      await detail.getByRole('button', { name: 'Reopen' }).click();
      await detail
        .getByLabel(/Why it is reopened/)
        .fill('The issue D splice changes the load path; confirm this claim again.');
      await detail.getByRole('button', { name: 'Reopen: move to Returned' }).click();
      await detail.getByText('Returned', { exact: true }).first().waitFor();
      await detail.getByText(/reopened it \(back to returned\)/).waitFor();
      await detail.getByLabel('Assigned to').selectOption({ label: 'Priya Halvorsen (consultant)' });
      await detail.getByLabel('Due date').fill('2026-12-18');
      await detail.getByRole('button', { name: 'Save assignment' }).click();
      await detail.getByText('assigned it to Priya Halvorsen, due 2026-12-18').waitFor();
      await shot('36-reopened-and-assigned');
      await closeDrawer();
      await goList(`?projectId=${projectId}&q=%23${reopenedId}`);
      await page
        .getByTestId('discrepancy-row')
        .first()
        .getByText('→ Priya Halvorsen · due 2026-12-18')
        .waitFor();
    },
  );

  await runner.step(
    'checker: the CSV export holds every filtered row behind a BOM, with unit columns',
    async () => {
      await goList(`?projectId=${projectId}&submittalId=${issueC}&includeSuperseded=true&status=`);
      // Wait for the rows of these filters (a resolved one among them) before reading the count.
      await page.getByTestId('discrepancy-row').filter({ hasText: 'Resolved' }).first().waitFor();
      await page.locator('[data-testid="discrepancy-list"][aria-busy="false"]').waitFor();
      const button = page.getByRole('button', { name: /^Export \d+ as CSV$/ });
      const total = Number(/Export (\d+)/.exec((await button.textContent()) ?? '')?.[1]);
      const [download] = await Promise.all([page.waitForEvent('download'), button.click()]);
      const kept = join(artifacts, '37-discrepancies.csv');
      await download.saveAs(kept);
      const bytes = readFileSync(kept);
      expect(bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf, 'the file starts with a UTF-8 BOM');
      const lines = bytes.toString('utf8').slice(1).split('\r\n');
      for (const column of ['"quantity"', '"claimed"', '"recomputed"', '"unit"', '"unit_system"'])
        expect(lines[0]?.includes(column), `the header has ${column}: ${lines[0]}`);
      expect(lines.length === total + 2, `one line per row (${lines.length - 2} for ${total})`);
      expect(
        lines.some((l) => l.includes('"An"') && l.includes('"in²"') && l.includes('"resolved"')),
        'a resolved An row carries its unit',
      );
      expect(
        download.suggestedFilename().startsWith(`discrepancies-project-${projectId}-submittal-${issueC}`),
        'named after the filter',
      );
    },
  );

  await runner.step('checker: a move someone else beat is told in words, not in HTTP', async () => {
    await goList(`?projectId=${projectId}&submittalId=${issueC}&status=raised`);
    await page
      .getByTestId('discrepancy-row')
      .first()
      .getByRole('button', { name: /^Open / })
      .click();
    const detail = drawer().getByTestId('discrepancy-detail');
    const id = await drawerId();
    await detail.getByRole('button', { name: 'Waive' }).click();
    await detail.getByLabel('Why it is waived').fill('Agreed at the site meeting.');
    // A colleague waives it first, from another browser.
    const other = await api(PEOPLE.checker, 'POST', `/api/discrepancies/${id}/transitions`, {
      to: 'waived',
      note: 'Waived by a colleague.',
    });
    expect(other.status === 200, `the colleague's move went through (${other.status})`);
    // The browser logs the refused request itself; that line is expected here.
    await expectingConsoleErrors(/status of 409/, async () => {
      await detail.getByRole('button', { name: /Waive: move to Waived/ }).click();
      await detail
        .getByRole('alert')
        .getByText(new RegExp(`Someone else changed discrepancy #${id} first: it is now Waived`))
        .waitFor();
    });
    await page.getByText('Someone else changed this first').first().waitFor();
    const text = await page.locator('body').innerText();
    expect(!/\b409\b|Conflict/.test(text), 'no HTTP jargon on the page');
    await shot('38-changed-meanwhile');
    await closeDrawer();
  });

  await runner.step(
    'consultant: the bell counts the news; a notification opens its item and is read',
    async () => {
      await signOut();
      await signIn(PEOPLE.consultant);
      const count = page.getByTestId('notification-count');
      await count.waitFor();
      const before = Number(await count.textContent());
      expect(before > 0, `unread notifications (${before})`);
      await page.getByTestId('notification-bell').click();
      await page.getByRole('heading', { name: 'What happened to your items' }).waitFor();
      const reopened = page.getByTestId('notification').filter({ hasText: 'Tomasz Quell reopened' }).first();
      await reopened.waitFor();
      await page
        .getByTestId('notification')
        .filter({ hasText: /assigned LG\d+ on .* to you/ })
        .first()
        .getByText('Due: 2026-12-18.')
        .waitFor();
      await shot('39-notifications');
      await page.setViewportSize({ width: 390, height: 844 });
      await shot('40-notifications-390');
      await page.setViewportSize({ width: 1280, height: 860 });
      await reopened.getByRole('link', { name: /^Tomasz Quell reopened/ }).click();
      await page.waitForURL(`**/discrepancies/${reopenedId}`);
      const detail = page.getByTestId('discrepancy-detail');
      await detail.getByText('Returned', { exact: true }).first().waitFor();
      await detail.getByRole('button', { name: 'Answer' }).click();
      await detail.getByLabel(/Your answer/).fill('Confirmed with the issue D load path: the claim stands.');
      await detail.getByRole('button', { name: /Answer: move to Answered/ }).click();
      await detail.getByText('Answered', { exact: true }).first().waitFor();
      await page.waitForFunction(
        (n) => Number(document.querySelector('[data-testid="notification-count"]')?.textContent ?? 0) === n,
        before - 1,
      );
    },
  );

  await runner.step(
    'consultant: turns off mail for waived items on the Account page; the service keeps the choice',
    async () => {
      await go('/account');
      const mail = page.getByRole('switch', { name: 'Waived: by mail' });
      await mail.waitFor();
      expect(await mail.isChecked(), 'mail for waived items is on by default');
      await mail.click();
      await page.getByText('Notification choices saved').first().waitFor();
      expect(!(await mail.isChecked()), 'the switch shows mail off');
      expect(
        await page.getByRole('switch', { name: 'Waived: in the app' }).isChecked(),
        'in the app still on',
      );
      // Stored by the service, not only shown (a reload would end this tab's session).
      const stored = await api(PEOPLE.consultant, 'GET', '/api/notifications/settings');
      const waived = stored.body.find((k) => k.kind === 'waived');
      expect(waived?.mail === false && waived?.inApp === true, `stored: ${JSON.stringify(waived)}`);
      await page.getByRole('heading', { name: 'Notifications' }).scrollIntoViewIfNeeded();
      await shot('41-account-notifications');
    },
  );

  await runner.step('checker: told of the answer in the app', async () => {
    await signOut();
    await signIn(PEOPLE.checker, '/notifications');
    await page
      .getByTestId('notification')
      .filter({ hasText: 'Priya Halvorsen answered' })
      .first()
      .getByText('Note: “Confirmed with the issue D load path: the claim stands.”')
      .waitFor();
    await page.getByRole('button', { name: 'Mark all read' }).click();
    await page.getByText('Nothing unread.').waitFor();
    await page.getByTestId('notification-count').waitFor({ state: 'detached' });
    await shot('42-checker-notifications-read');
  });

  await runner.step('admin: the demo mailbox holds the notice mail, in words, with its link', async () => {
    // The outbox worker sends every half second; a flush sends what is due now, so nothing waits on time.
    for (;;) {
      const outbox = await api(PEOPLE.admin, 'GET', '/api/mail/outbox');
      if (!outbox.body.some((m) => m.status === 'pending')) break;
      await api(PEOPLE.admin, 'POST', '/api/mail/outbox/flush');
    }
    await signOut();
    await signIn(PEOPLE.admin, '/mailbox');
    const message = page
      .getByRole('button', { name: /Tomasz Quell reopened .* Harbour Lantern Footbridge/ })
      .first();
    await message.click();
    const body = page.locator('pre');
    await body.getByText(`/discrepancies/${reopenedId}`).waitFor();
    const text = (await body.textContent()) ?? '';
    expect(
      text.includes('Reason: “The issue D splice changes the load path; confirm this claim again.”'),
      'the reason',
    );
    expect(text.includes('It is now Returned.'), 'the new status in words');
    expect(!/\b(HTTP|409|403|Conflict|Forbidden)\b/.test(text), 'no HTTP jargon in the mail');
    await shot('43-mailbox-notice');
  });

  Object.assign(state, { issueD, reopenedId });
}
