/**
 * commander, the one place the command line imports it from. The bin is bundled (see the `build:bin`
 * script), so commander's files are inlined into dist/cli.js rather than resolved and loaded one by one
 * from node_modules at start-up; `ligament --help` has to stay close to a bare `node -e 0`.
 */
export { Command, CommanderError, InvalidArgumentError, Option } from 'commander';
