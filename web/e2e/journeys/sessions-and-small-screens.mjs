// Issue 13, part 2, as each role meets it: sessions that survive a reload and a new tab and end
// everywhere on sign-out; the admin revoking and resending invitations, and a dead invitation link
// leading to sign-in; the member drawing legible, zoomable, downloadable, with the claimed chain
// beside the governing one; a revision's changes by meaning; and every main screen at 390 px with a
// menu for the navigation, no clipped table and headings in order.
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { artifacts, repoRoot } from '../harness.mjs';
import { PEOPLE, expect, pageProblems } from '../session.mjs';

const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 860 };
/** The seeded demo (api/src/seed): submittal 1 is issue A, submittal 2 (issue B) revises it. */
const ISSUE_A = 1;
const ISSUE_B = 2;

/**
 * @param {{ runner: ReturnType<typeof import('../harness.mjs').createRunner>,
 *   session: ReturnType<typeof import('../session.mjs').createSession>,
 *   state: Record<string, unknown> }} ctx
 */
export default async function sessionsAndSmallScreens({ runner, session, state }) {
  const { page, server, shot, go, signIn, signOut, expectingConsoleErrors } = session;
  const context = page.context();
  const projectId = Number(state.projectId ?? 1);
  const accountMenu = () => page.getByRole('button', { name: /Account menu for/ });
  const cookies = async () => Object.fromEntries((await context.cookies()).map((c) => [c.name, c]));
  /** Waits until no spinner is left on the page: every query of the screen has answered. */
  const settled = () => page.waitForFunction(() => !document.querySelector('.fui-Spinner'));
  const signOutIfSignedIn = async () => {
    if (await accountMenu().count()) await signOut();
  };
  const noProblems = async (where) => {
    const problems = await pageProblems(page);
    expect(problems.length === 0, `${where}: ${problems.join('; ')}`);
  };

  await runner.step('setting out: signed out, at desktop width', async () => {
    await page.setViewportSize(DESKTOP);
    // Away from whatever the journey before left open (a detail drawer covers the header).
    if (await accountMenu().count()) await go('/account');
    await signOutIfSignedIn();
  });

  await runner.step(
    'every role stays signed in across a reload and in a new tab; the refresh cookie is httpOnly',
    async () => {
      for (const [email, landing] of [
        [PEOPLE.ownerRep, 'Open discrepancies'],
        [PEOPLE.consultant, 'Your projects'],
        [PEOPLE.checker, 'Your projects'],
        [PEOPLE.admin, 'Your projects'],
      ]) {
        await signIn(email);
        await page.getByRole('heading', { level: 1, name: landing }).waitFor();
        const who = await accountMenu().getAttribute('aria-label');
        const url = page.url();
        await page.reload();
        await page.getByRole('heading', { level: 1, name: landing }).waitFor();
        expect(
          (await accountMenu().getAttribute('aria-label')) === who,
          `${email}: still ${who} after a reload`,
        );
        expect(page.url() === url, `${email}: the reload stays on ${url} (now ${page.url()})`);

        const jar = await cookies();
        const refresh = jar.ligament_session;
        expect(refresh?.httpOnly === true, `${email}: the refresh cookie is httpOnly`);
        expect(refresh?.sameSite === 'Strict', `${email}: the refresh cookie is SameSite=Strict`);
        expect(
          refresh?.path === '/api/auth/session',
          `${email}: the refresh cookie is scoped to /api/auth/session`,
        );
        const script = await page.evaluate(() => ({
          cookie: document.cookie,
          storage: JSON.stringify({ ...localStorage, ...sessionStorage }),
        }));
        expect(!script.cookie.includes('ligament_session'), 'scripts cannot read the refresh cookie');
        expect(!/eyJ|lgr_/.test(script.storage), 'no token in localStorage or sessionStorage');

        const tab = await context.newPage();
        await tab.goto(`${server.baseUrl}/account`);
        const name = who?.replace('Account menu for ', '') ?? '';
        await tab.getByRole('heading', { level: 1, name }).waitFor();
        if (email === PEOPLE.checker)
          await tab.screenshot({ path: join(artifacts, '30-new-tab-signed-in.png') });
        await tab.close();
        await signOut();
        expect(!(await cookies()).ligament_session, `${email}: signing out clears the refresh cookie`);
      }
      await shot('31-signed-out');
    },
  );

  await runner.step("signing out in one tab ends the other tab's session at its next request", async () => {
    await signIn(PEOPLE.consultant);
    await page.getByRole('heading', { level: 1, name: 'Your projects' }).waitFor();
    const tab = await context.newPage();
    await tab.goto(`${server.baseUrl}/account`);
    await tab.getByRole('button', { name: /Account menu for/ }).click();
    await tab.getByRole('menuitem', { name: 'Sign out' }).click();
    await tab.getByRole('heading', { name: 'Sign in' }).waitFor();
    await tab.close();
    // This tab still shows its page; the next thing it asks the server is refused (401), and it
    // cannot renew: to sign-in, to come back to where the user was going.
    await expectingConsoleErrors(/status of 401/, async () => {
      await page
        .getByRole('navigation', { name: 'Main' })
        .getByRole('link', { name: 'Discrepancies' })
        .click();
      await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    });
    expect(
      new URL(page.url()).searchParams.get('redirectTo')?.startsWith('/discrepancies'),
      `sent to sign in and back to the discrepancies (${page.url()})`,
    );
    await shot('32-other-tab-signed-out');
    // A reload of a signed-out page asks the server nothing: the flag cookie is gone too.
    await page.reload();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
  });

  /** The link in the newest demo-mailbox message to `to` whose subject matches. */
  const invitationLink = async (to, subject) => {
    await go('/mailbox');
    const item = page
      .getByRole('button')
      .filter({ hasText: `to ${to}` })
      .filter({ hasText: subject });
    await item.first().waitFor({ timeout: 30_000 });
    await item.first().click();
    const body = await page.locator('pre').innerText();
    const link = /https?:\/\/\S+\/invitations\/inv_[A-Za-z0-9_-]+/.exec(body)?.[0];
    expect(link, `the mail to ${to} carries an invitation link`);
    return link;
  };

  const links = {};
  await runner.step('admin sees roles in words, revokes one invitation and sends another again', async () => {
    await signIn(PEOPLE.admin, '/admin');
    await page.getByRole('table', { name: 'Users' }).waitFor();
    const users = await page.locator('main').innerText();
    expect(/Owner’s representative/.test(users), 'the users table names the owner’s representative in words');
    expect(!/owner-rep|owner_rep/.test(users), 'no role is shown as its code');
    await shot('33-admin-roles-in-words');

    await page.getByRole('tab', { name: 'Invitations' }).click();
    const form = page.getByRole('form', { name: 'Invite someone' });
    const invite = async (name, email, role) => {
      await form.getByLabel('Name').fill(name);
      await form.getByLabel('E-mail').fill(email);
      await form.getByRole('combobox', { name: 'Role' }).click();
      await page.getByRole('option', { name: role }).click();
      await form.getByRole('button', { name: 'Send invitation' }).click();
      await page
        .getByRole('row')
        .filter({ hasText: email })
        .getByText(/^Waiting, until/)
        .waitFor();
    };
    await invite('Ines Marr', 'ines.marr@larchmont-review.example.test', 'Checker');
    const ines = page.getByRole('row').filter({ hasText: 'ines.marr@' });
    await ines
      .getByRole('button', { name: 'Revoke the invitation to ines.marr@larchmont-review.example.test' })
      .click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText('stops working at once').waitFor();
    await shot('34-admin-revoke-confirm');
    await dialog.getByRole('button', { name: 'Revoke invitation' }).click();
    await ines.getByText(/^Revoked /).waitFor();
    expect((await ines.getByRole('button').count()) === 0, 'a revoked invitation offers no more actions');

    await invite('Wen Okafor', 'wen.okafor@tidewater-crossing.example.test', 'Owner’s representative');
    await page
      .getByRole('row')
      .filter({ hasText: 'wen.okafor@' })
      .getByRole('button', { name: /^Send the invitation to wen\.okafor@.* again/ })
      .click();
    await page.getByText('Invitation sent again', { exact: true }).waitFor();
    const wen = page.getByRole('row').filter({ hasText: 'wen.okafor@' });
    await wen.filter({ hasText: 'Sent again with a new link' }).waitFor();
    await wen.filter({ hasText: /Waiting, until/ }).waitFor();
    const table = await page.getByRole('table', { name: 'Invitations' }).innerText();
    expect(/Owner’s representative/.test(table) && !/owner-rep/.test(table), 'invitation roles in words');
    await shot('35-admin-invitations');

    links.revoked = await invitationLink(
      'ines.marr@larchmont-review.example.test',
      'You are invited to Ligament',
    );
    links.replaced = await invitationLink(
      'wen.okafor@tidewater-crossing.example.test',
      'You are invited to Ligament',
    );
    links.fresh = await invitationLink('wen.okafor@tidewater-crossing.example.test', 'with a new link');
    expect(links.replaced !== links.fresh, 'the resent invitation has a new link');
    await signOut();
  });

  await runner.step(
    'a revoked, a replaced and a used invitation link each say why and lead to sign-in',
    async () => {
      const deadLink = async (link, why, screenshot) => {
        await expectingConsoleErrors(/status of 410/, async () => {
          await page.goto(link);
          await page
            .getByRole('heading', { level: 1, name: 'This invitation link cannot be used' })
            .waitFor();
          await page.getByText(why).waitFor();
        });
        await noProblems(`dead invitation link (${why})`);
        if (screenshot) await shot(screenshot);
        await page.getByRole('button', { name: 'Go to sign in' }).click();
        await page.getByRole('heading', { name: 'Sign in' }).waitFor();
      };
      await deadLink(links.revoked, 'withdrawn by an admin', '36-invitation-revoked');
      await deadLink(links.replaced, 'sent again with a new link');

      await page.goto(links.fresh);
      await page.getByRole('heading', { level: 1, name: 'Welcome, Wen Okafor' }).waitFor();
      await page.getByText('You are invited as owner’s representative').waitFor();
      await page
        .getByLabel(/^Password/)
        .first()
        .fill('heron gusset plate forty-two');
      await page.getByLabel('Password again').fill('heron gusset plate forty-two');
      await page.getByRole('button', { name: 'Activate my account' }).click();
      await page.getByRole('heading', { name: 'You are in' }).waitFor();

      await deadLink(links.fresh, 'already been used to set up an account', '37-invitation-used');
      await page.getByLabel('E-mail').fill('wen.okafor@tidewater-crossing.example.test');
      await page.getByLabel('Password').fill('heron gusset plate forty-two');
      await page.getByRole('button', { name: 'Sign in', exact: true }).click();
      await page.getByRole('button', { name: 'Account menu for Wen Okafor' }).waitFor();
      await signOut();
    },
  );

  const drawing = () => page.getByTestId('member-drawing');
  /** The size on screen, in px, of every label of the drawing. */
  const labelSizes = () =>
    drawing().evaluate((svg) =>
      [...svg.querySelectorAll('text')].map((t) => {
        const m = t.getScreenCTM();
        return Math.hypot(m.a, m.b) * Number.parseFloat(t.getAttribute('font-size'));
      }),
    );
  const openNorthSplice = async () => {
    await go(`/submittals/${ISSUE_A}`);
    await page.getByRole('tab', { name: /dc-splice-north\.json/ }).click();
    await drawing().locator('[data-claimed-chain]').waitFor();
  };

  await runner.step(
    'checker: at 1280 px no label of the drawing is under 11 px; the claimed chain is drawn beside the governing one',
    async () => {
      await page.setViewportSize(DESKTOP);
      await signIn(PEOPLE.checker);
      await openNorthSplice();
      const sizes = await labelSizes();
      expect(sizes.length > 20, `the drawing has its labels (${sizes.length})`);
      expect(
        Math.min(...sizes) >= 11,
        `every label is 11 px or more (smallest ${Math.min(...sizes).toFixed(2)} px)`,
      );
      // Issue A claims A1–C1 controls (api/src/seed/calc/rev-a/dc-splice-north.json); A1–B1–C1–D1 governs.
      const claimed = drawing().locator('[data-claimed-chain]');
      expect((await claimed.getAttribute('data-claimed-chain')) === 'A1 C1', 'the claimed chain is A1–C1');
      expect((await claimed.locator('polygon').count()) === 2, 'a diamond round each claimed hole');
      expect(
        (await drawing().locator('[data-fracture]').first().getAttribute('data-chain')) === 'A1 B1 C1 D1',
        'the governing chain is drawn',
      );
      const legend = page.getByRole('list', { name: 'Lines on the drawing' });
      await legend.getByText(/Governing fracture line, load from −x \(dashed/).waitFor();
      await legend.getByText(/Chain the calc file claims controls \(solid, diamonds/).waitFor();
      await noProblems('submittal, member drawing at 1280 px');
      await shot('40-drawing-claimed-1280');
    },
  );

  await runner.step(
    'checker: the drawing zooms (buttons, Ctrl + wheel, keys) and pans (drag, arrows), and resets',
    async () => {
      const zoom = () => page.getByTestId('drawing-zoom').textContent();
      const viewBox = async () => (await drawing().getAttribute('viewBox')).split(' ').map(Number);
      const viewport = page.getByTestId('drawing-viewport');
      const start = await viewBox();
      await page.getByRole('button', { name: 'Zoom in (+)' }).click();
      await page.getByTestId('drawing-zoom').getByText('125 %').waitFor();
      expect((await viewBox())[2] < start[2], 'zooming in shows less of the sheet');
      // The drawing's top at the top of the window, so the pointer's spot is on screen.
      await viewport.evaluate((el) => el.scrollIntoView({ block: 'start' }));
      const box = await viewport.boundingBox();
      const cx = box.x + box.width / 2;
      const cy = box.y + Math.min(box.height / 2, 300);
      await page.mouse.move(cx, cy);
      await page.keyboard.down('Control');
      await page.mouse.wheel(0, -400);
      await page.keyboard.up('Control');
      await page.waitForFunction(
        () => document.querySelector('[data-testid="drawing-zoom"]').textContent !== '125 %',
      );
      const wheeled = Number.parseInt(await zoom(), 10);
      expect(wheeled > 125, `Ctrl + wheel zooms in (${wheeled} %)`);
      const sizes = await labelSizes();
      expect(Math.min(...sizes) >= 11, 'zoomed in, labels are still 11 px or more');

      const before = await viewBox();
      await page.mouse.move(cx, cy);
      await page.mouse.down();
      await page.mouse.move(cx - 150, cy - 60, { steps: 6 });
      await page.mouse.up();
      const dragged = await viewBox();
      expect(
        dragged[0] > before[0] && dragged[1] > before[1],
        `dragging left and up moves the view right and down (${before} → ${dragged})`,
      );

      await viewport.focus();
      await page.keyboard.press('ArrowLeft');
      const keyed = await viewBox();
      expect(keyed[0] < dragged[0], 'the left arrow pans left');
      await page.keyboard.press('-');
      expect(Number.parseInt(await zoom(), 10) < wheeled, 'the − key zooms out');
      await shot('41-drawing-zoomed');
      await page.keyboard.press('0');
      await page.getByTestId('drawing-zoom').getByText('100 %').waitFor();
      expect(String(await viewBox()) === String(start), 'the 0 key goes back to the starting view');
      expect(
        await page.getByRole('button', { name: 'Reset view' }).isDisabled(),
        'nothing to reset at the start',
      );

      // A plain wheel scrolls the page and leaves the zoom alone.

      const scrolled = await page.evaluate(() => window.scrollY);

      await page.mouse.move(cx, cy);

      await page.mouse.wheel(0, 300);

      await page.waitForFunction((y) => window.scrollY > y, scrolled);
      expect((await zoom()) === '100 %', 'a plain wheel does not zoom');
      await page.evaluate(() => window.scrollTo(0, 0));
    },
  );

  await runner.step(
    'checker: the drawing downloads as the SVG ligament draw writes, and as a PNG of it',
    async () => {
      const [svgFile] = await Promise.all([
        page.waitForEvent('download'),
        page.getByRole('button', { name: 'Download SVG' }).click(),
      ]);
      expect(
        svgFile.suggestedFilename() === 'SP-N1-drawing.svg',
        `SVG file name (${svgFile.suggestedFilename()})`,
      );
      const svg = readFileSync(await svgFile.path(), 'utf8');
      const parsed = await page.evaluate((text) => {
        const doc = new DOMParser().parseFromString(text, 'image/svg+xml');
        const root = doc.documentElement;
        return {
          error: doc.querySelector('parsererror')?.textContent ?? null,
          root: root.localName,
          ns: root.namespaceURI,
          width: root.getAttribute('width'),
          claimed: doc.querySelector('[data-claimed-chain]')?.getAttribute('data-claimed-chain') ?? null,
        };
      }, svg);
      expect(parsed.error === null, `the SVG is well-formed XML: ${parsed.error}`);
      expect(parsed.root === 'svg' && parsed.ns === 'http://www.w3.org/2000/svg', 'an SVG document');
      expect(parsed.claimed === 'A1 C1', 'the file carries the claimed chain');
      // The same serialiser as the command line: every line `ligament draw` writes for this member is in
      // the download, which adds only the claimed chain.
      const cli = execFileSync(
        process.execPath,
        [
          join(repoRoot, 'cli', 'dist', 'cli.js'),
          'draw',
          join(repoRoot, 'api', 'src', 'seed', 'calc', 'rev-a', 'dc-splice-north.json'),
          '--member',
          'SP-N1',
        ],
        { encoding: 'utf8' },
      );
      const downloaded = new Set(svg.split('\n'));
      const missing = cli.split('\n').filter((line) => !downloaded.has(line));
      expect(
        missing.length === 0,
        `every line of ligament draw is in the download (missing: ${missing.slice(0, 2).join(' | ')})`,
      );
      const cliLines = new Set(cli.split('\n'));
      const extra = svg.split('\n').filter((line) => !cliLines.has(line));
      expect(
        extra.length === 1 && extra[0].startsWith('<g data-claimed-chain="A1 C1"'),
        `the download adds only the claimed chain (${extra.length} lines)`,
      );

      const [pngFile] = await Promise.all([
        page.waitForEvent('download'),
        page.getByRole('button', { name: 'Download PNG' }).click(),
      ]);
      expect(
        pngFile.suggestedFilename() === 'SP-N1-drawing.png',
        `PNG file name (${pngFile.suggestedFilename()})`,
      );
      const png = readFileSync(await pngFile.path());
      expect(png.subarray(0, 8).equals(Buffer.from([137, 80, 78, 71, 13, 10, 26, 10])), 'a PNG file');
      const sheetMm = Number.parseFloat(parsed.width);
      const expected = Math.round((sheetMm / 25.4) * 200);
      expect(
        png.readUInt32BE(16) === expected,
        `200 dpi: ${png.readUInt32BE(16)} px wide for ${sheetMm} mm (want ${expected})`,
      );
      // Not blank: the plate's lines darken a share of its pixels.
      const inked = await page.evaluate(async (base64) => {
        const image = new Image();
        image.src = `data:image/png;base64,${base64}`;
        await image.decode();
        const canvas = document.createElement('canvas');
        canvas.width = image.width;
        canvas.height = image.height;
        const g = canvas.getContext('2d');
        g.drawImage(image, 0, 0);
        const { data } = g.getImageData(0, 0, image.width, image.height);
        let dark = 0;
        for (let i = 0; i < data.length; i += 4) if (data[i] + data[i + 1] + data[i + 2] < 300) dark += 1;
        return dark / (data.length / 4);
      }, png.toString('base64'));
      expect(inked > 0.002, `the PNG shows the drawing (${(inked * 100).toFixed(2)} % dark pixels)`);
    },
  );

  await runner.step(
    "owner's rep at 390 px: the drawing starts zoomed in, labels 11 px or more, and pans",
    async () => {
      await signOutIfSignedIn();
      await page.setViewportSize(PHONE);
      await signIn(PEOPLE.ownerRep);
      await openNorthSplice();
      const sizes = await labelSizes();
      expect(
        Math.min(...sizes) >= 11,
        `every label is 11 px or more at 390 px (smallest ${Math.min(...sizes).toFixed(2)})`,
      );
      const height = (await page.getByTestId('drawing-viewport').boundingBox()).height;
      expect(
        height <= 0.75 * PHONE.height + 1,
        `the drawing leaves room to reach the page (${height} px tall)`,
      );
      await noProblems('submittal at 390 px');
      await shot('42-drawing-390');
    },
  );

  await runner.step(
    'consultant: a revision lists its changes by meaning beside the text diff, at 1280 and 390 px',
    async () => {
      await signOutIfSignedIn();
      await page.setViewportSize(DESKTOP);
      await signIn(PEOPLE.consultant, `/submittals/${ISSUE_B}`);
      await page.getByRole('tab', { name: /Changes from #/ }).click();
      const meaning = page.getByRole('list', { name: 'Changes by meaning in dc-splice-north.json' });
      const an = meaning.getByTestId('meaning-change').filter({ hasText: 'SP-N1 · claimed An' });
      await an.waitFor();
      expect((await an.locator('del').textContent()) === '6.125 in²', 'old An with its unit');
      expect((await an.locator('ins').textContent()) === '5.508 in²', 'new An with its unit');
      await meaning
        .getByTestId('meaning-change')
        .filter({ hasText: 'claimed controlling chain' })
        .filter({ hasText: 'A1–B1–C1–D1' })
        .waitFor();
      await page.getByRole('region', { name: 'Changes in dc-splice-north.json' }).waitFor();
      await noProblems('revision diff at 1280 px');
      await shot('43-revision-by-meaning-1280');
      await page.setViewportSize(PHONE);
      await an.waitFor();
      await noProblems('revision diff at 390 px');
      await shot('44-revision-by-meaning-390');
    },
  );

  await runner.step(
    'checker at 390 px: file tabs that overflow show an arrow and fades, and scroll by button or keyboard',
    async () => {
      await signOutIfSignedIn();
      await signIn(PEOPLE.checker, `/submittals/${ISSUE_A}`);
      const tabs = page.getByRole('region', { name: 'Calc files' });
      await tabs.getByRole('tab').first().waitFor();
      const outer = tabs.locator('xpath=..');
      await page.waitForFunction(() => document.querySelector('[data-more-after]') !== null);
      expect((await outer.getAttribute('data-more-after')) === 'true', 'more tabs to the right are marked');
      await shot('45-file-tabs-cue-390');
      await page.getByRole('button', { name: 'Calc files: scroll right' }).click();
      await page.waitForFunction(() => document.querySelector('[data-more-before]') !== null);
      await page.getByRole('button', { name: 'Calc files: scroll left' }).waitFor();
      // From the keyboard: arrow keys move along the tabs and the focused one scrolls into view.
      await tabs.getByRole('tab').first().focus();
      const count = await tabs.getByRole('tab').count();
      for (let i = 1; i < count; i++) await page.keyboard.press('ArrowRight');
      const last = tabs.getByRole('tab').last();
      const lastBox = await last.boundingBox();
      expect(
        (await last.evaluate((el) => el === document.activeElement)) &&
          lastBox.x >= 0 &&
          lastBox.x + lastBox.width <= PHONE.width,
        `the last tab has focus and is in view (${Math.round(lastBox.x)}–${Math.round(lastBox.x + lastBox.width)} px)`,
      );
    },
  );

  const P = projectId;
  const screens = {
    "owner's rep": [
      PEOPLE.ownerRep,
      [
        ['/dashboard', 'Open discrepancies'],
        ['/projects', 'Your projects'],
        [`/projects/${P}`, 'Harbour Lantern Footbridge'],
        [`/discrepancies?projectId=${P}`, 'Discrepancies'],
        [`/submittals/${ISSUE_B}`, /issue B/],
        [`/submittals/${ISSUE_A}/report`, `Review report — submittal #${ISSUE_A}`],
        ['/account', 'Adaeze Marlow'],
      ],
    ],
    consultant: [
      PEOPLE.consultant,
      [
        ['/projects', 'Your projects'],
        [`/projects/${P}`, 'Harbour Lantern Footbridge'],
        [`/projects/${P}/upload`, 'Upload calc files'],
        [`/discrepancies?projectId=${P}`, 'Discrepancies'],
        [`/submittals/${ISSUE_A}`, /issue A/],
        ['/account', 'Priya Halvorsen'],
      ],
    ],
    checker: [
      PEOPLE.checker,
      [
        ['/dashboard', 'Open discrepancies'],
        ['/projects', 'Your projects'],
        [`/projects/${P}`, 'Harbour Lantern Footbridge'],
        [`/discrepancies?projectId=${P}`, 'Discrepancies'],
        [`/submittals/${ISSUE_B}`, /issue B/],
        [`/submittals/${ISSUE_B}/report`, `Review report — submittal #${ISSUE_B}`],
        ['/account', 'Tomasz Quell'],
      ],
    ],
    admin: [
      PEOPLE.admin,
      [
        ['/admin', 'People and projects'],
        ['/mailbox', 'Demo mailbox'],
        ['/dashboard', 'Open discrepancies'],
        ['/projects', 'Your projects'],
        [`/projects/${P}`, 'Harbour Lantern Footbridge'],
        ['/account', 'Sam Oduya'],
      ],
    ],
  };
  /**
   * Opens `path` and waits for its own h1 and for every query to answer, then for the page's
   * structure to hold (headings in order, nothing clipped): charts and tables settle a moment after
   * the data arrives, so the check is asked again until it holds or 10 s pass.
   */
  const checkScreen = async (path, h1, where) => {
    await go(path);
    await page.getByRole('heading', { level: 1, name: h1 }).waitFor();
    await settled();
    let problems = await pageProblems(page);
    for (let tries = 0; problems.length > 0 && tries < 20; tries++) {
      await page.waitForTimeout(500);
      problems = await pageProblems(page);
    }
    expect(problems.length === 0, `${where}, ${path}: ${problems.join('; ')}`);
  };
  for (const [role, [email, screensOfRole]] of Object.entries(screens)) {
    const tag = role.replace(/[^a-z]+/g, '-');
    await runner.step(
      `${role} at 390 px: the navigation is a menu; every main screen fits, tables scroll, headings in order`,
      async () => {
        await signOutIfSignedIn();
        await page.setViewportSize(PHONE);
        await signIn(email);
        await page.getByRole('heading', { level: 1 }).waitFor();
        const nav = page.getByRole('navigation', { name: 'Main' });
        const menu = page.getByRole('button', { name: 'Menu', exact: true });
        expect(!(await nav.isVisible()), 'the navigation is folded away');
        expect((await menu.getAttribute('aria-expanded')) === 'false', 'the menu button says it is closed');
        await menu.click();
        await nav.getByRole('link', { name: 'Account' }).waitFor();
        expect((await menu.getAttribute('aria-expanded')) === 'true', 'the menu button says it is open');
        await shot(`50-${tag}-menu-390`);
        await page.keyboard.press('Escape');
        await nav.waitFor({ state: 'hidden' });
        await menu.click();
        await nav.getByRole('link', { name: 'Account' }).click();
        await nav.waitFor({ state: 'hidden' });
        await page.getByRole('heading', { level: 2, name: 'Signed in' }).waitFor();
        for (const [path, h1] of screensOfRole) {
          await checkScreen(path, h1, `${role} at 390 px`);
          await shot(`51-${tag}-${path.replace(/[^a-z0-9]+/gi, '-').replace(/^-|-$/g, '')}-390`);
        }
        await page.setViewportSize(DESKTOP);
        for (const [path, h1] of screensOfRole) await checkScreen(path, h1, `${role} at 1280 px`);
      },
    );
  }

  await runner.step('back to desktop width, signed out', async () => {
    await page.setViewportSize(DESKTOP);
    await signOutIfSignedIn();
    await page.getByRole('heading', { name: 'Sign in' }).waitFor();
    await noProblems('sign-in page');
  });
}
