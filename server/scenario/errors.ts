/** The error a bad scenario gives: the field (dotted path) and what is wrong with it. */
import { InputError } from '../../sim/errors.js';

export class ScenarioError extends InputError {
  /** Every problem found, each "field: message"; the first is also the error's message. */
  readonly problems: string[];
  constructor(field: string, message: string, problems?: string[]) {
    super(field, message);
    this.name = 'ScenarioError';
    this.problems = problems ?? [this.message];
  }
}
