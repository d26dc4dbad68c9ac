/**
 * Parsing and loading scenario files: JSON text → validated file → SI scenario.
 * The only scenario entry point for the CLI, the HTTP server and the tests.
 */
import { parseJsonText, readInputFile } from '../json-file.js';
import type * as z from 'zod';
import type { Scenario } from '../../sim/scenario.js';
import { convertScenario } from './convert.js';
import { ScenarioError } from './errors.js';
import { scenarioFileSchemaForParsing, type ScenarioFile } from './schema.js';

/** Formats zod issues as "field: message" lines, naming unknown keys. */
export function describeIssues(issues: readonly z.core.$ZodIssue[]): string[] {
  return issues.map((issue) => {
    const path = issue.path.map(String).join('.');
    if (issue.code === 'unrecognized_keys') {
      const keys = issue.keys.map((k) => (path ? `${path}.${k}` : k));
      return `${keys.join(', ')}: unknown key${keys.length > 1 ? 's' : ''} (not part of the scenario format)`;
    }
    if (issue.code === 'invalid_union' && issue.message === 'Invalid input') {
      return `${path || 'scenario'}: does not match any allowed form`;
    }
    return `${path || 'scenario'}: ${issue.message}`;
  });
}

/** Validates a parsed JSON value as a scenario file; throws ScenarioError listing every problem. */
export function validateScenarioFile(value: unknown): ScenarioFile {
  const result = scenarioFileSchemaForParsing.safeParse(value);
  if (!result.success) {
    const problems = describeIssues(result.error.issues);
    const [field, ...rest] = problems[0].split(': ');
    throw new ScenarioError(field, rest.join(': '), problems);
  }
  return result.data as ScenarioFile;
}

/** Parses, validates and converts a scenario given as a JSON value. */
export function scenarioFromJson(value: unknown): { file: ScenarioFile; scenario: Scenario } {
  const file = validateScenarioFile(value);
  return { file, scenario: convertScenario(file) };
}

/** Parses scenario JSON text (with a clear message for malformed JSON). */
export function scenarioFromText(text: string, source = 'scenario'): { file: ScenarioFile; scenario: Scenario } {
  return scenarioFromJson(parseJsonText(text, source, (message) => new ScenarioError('', message)));
}

/** Reads a scenario file from disk. Throws ScenarioError for unreadable files or bad content. */
export async function loadScenarioFile(path: string): Promise<{ file: ScenarioFile; scenario: Scenario }> {
  const text = await readInputFile(path, 'scenario file', (message) => new ScenarioError('', message));
  return scenarioFromText(text, path);
}
