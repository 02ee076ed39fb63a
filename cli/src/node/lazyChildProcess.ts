/**
 * What the bundled bin gives commander for `node:child_process` (see the `build:bin` script's
 * `--alias`). commander requires child_process at load time but only spawns anything for
 * stand-alone executable subcommands, which ligament has none of; loading the real module (and the
 * net, dgram and socket modules it pulls in) is a large share of `ligament --help`'s start-up, so it
 * is fetched on the first spawn instead.
 */
type ChildProcess = typeof import('node:child_process');

export const spawn = ((...args: Parameters<ChildProcess['spawn']>) =>
  process.getBuiltinModule('node:child_process').spawn(...args)) as ChildProcess['spawn'];
