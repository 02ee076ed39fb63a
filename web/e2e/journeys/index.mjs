// The journeys of the browser run, in the order they run. A journey is
// `async ({ runner, session, state }) => void`: it adds steps with `runner.step(name, fn)`, drives
// the page through `session` (see ../session.mjs), and may read or leave ids in `state`.
// A new feature's journey goes in a file of its own here and one line below.
import reviewLoop from './review-loop.mjs';
import revisionsAndNotices from './revisions-and-notices.mjs';

export const journeys = [
  ['review loop (checker, consultant, owner’s rep, admin)', reviewLoop],
  [
    'revisions, reopening, assignment and notices (owner’s rep, checker, consultant, admin)',
    revisionsAndNotices,
  ],
];
