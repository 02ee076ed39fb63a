/**
 * commander, loaded through its CommonJS entry. Its ESM entry is a wrapper that makes Node parse the
 * CommonJS file for named exports first, which costs about as much again as commander itself at
 * start-up; `ligament --help` has to stay close to a bare `node -e 0`. The classes are the same
 * objects either way, so `instanceof` checks against either import agree.
 */
import { createRequire } from 'node:module';
import type * as CommanderModule from 'commander';

const commander = createRequire(import.meta.url)('commander') as typeof CommanderModule;

export const Command = commander.Command;
export type Command = CommanderModule.Command;
export const Option = commander.Option;
export type Option = CommanderModule.Option;
export const InvalidArgumentError = commander.InvalidArgumentError;
export type InvalidArgumentError = CommanderModule.InvalidArgumentError;
export const CommanderError = commander.CommanderError;
export type CommanderError = CommanderModule.CommanderError;
