/** Registers every command of the CLI. */
import type { Command } from 'commander';
import { registerProfile } from './profile.js';

export function registerCommands(program: Command): void {
  registerProfile(program);
}
