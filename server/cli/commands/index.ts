/** Registers every command of the CLI. */
import type { Command } from 'commander';
import { registerEnsemble } from './ensemble.js';
import { registerProfile } from './profile.js';
import { registerSighting } from './sighting.js';

export function registerCommands(program: Command): void {
  registerProfile(program);
  registerEnsemble(program);
  registerSighting(program);
}
