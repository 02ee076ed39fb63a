// The journeys of the browser run, in the order they run. A journey is
// `async ({ runner, session, state }) => void`: it adds steps with `runner.step(name, fn)`, drives
// the page through `session` (see ../session.mjs), and may read or leave ids in `state`.
// A new feature's journey goes in a file of its own here and one line below.
import drawerFocusAndUnits from './drawer-focus-and-units.mjs';
import reviewLoop from './review-loop.mjs';
import revisionsAndNotices from './revisions-and-notices.mjs';
import sessionsAndSmallScreens from './sessions-and-small-screens.mjs';

export const journeys = [
  ['review loop (checker, consultant, owner’s rep, admin)', reviewLoop],
  ['discrepancy drawer at 390 px: focus and units', drawerFocusAndUnits],
  [
    'revisions, reopening, assignment and notices (owner’s rep, checker, consultant, admin)',
    revisionsAndNotices,
  ],
  [
    'sessions, invitations, drawing, revision by meaning and small screens (every role)',
    sessionsAndSmallScreens,
  ],
];
