/** Registers every command of the CLI. */
import type { Command } from 'commander';
import { registerEnsemble } from './ensemble.js';
import { registerOutlook } from './outlook.js';
import { registerProfile } from './profile.js';
import { registerTrace } from './trace.js';
import { registerReport } from './report.js';
import { registerSighting } from './sighting.js';
import { registerHorizon } from './horizon.js';
import { registerTransfer } from './transfer.js';
import { registerVisibility } from './visibility.js';
import { registerRefraction } from './refraction.js';
import { registerFindings } from './findings.js';

export function registerCommands(program: Command): void {
  registerProfile(program);
  registerTrace(program);
  registerHorizon(program);
  registerTransfer(program);
  registerVisibility(program);
  registerRefraction(program);
  registerFindings(program);
  registerOutlook(program);
  registerEnsemble(program);
  registerReport(program);
  registerSighting(program);
}
