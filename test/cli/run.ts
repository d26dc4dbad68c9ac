/**
 * Runs the CLI in this process (server/cli/main.ts) with stdout and stderr captured, and checks
 * the JSON field types the DESIGN.md §6 contracts name.
 */
import { expect, vi } from 'vitest';
import { main } from '../../server/cli/main.js';

/** Result of one CLI run. */
export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Runs `loomline <args>`; returns the exit code and the captured output. */
export async function runCli(...args: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => ((stdout += String(chunk)), true));
  vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => ((stderr += String(chunk)), true));
  try {
    const code = await main(args);
    return { code, stdout, stderr };
  } finally {
    vi.restoreAllMocks();
    process.exitCode = undefined;
  }
}

/** Runs with --json, expects exit 0 and exactly one JSON object on stdout, and returns it. */
export async function runJson(...args: string[]): Promise<Record<string, unknown>> {
  const run = await runCli(...args, '--json');
  expect(run.stderr).toBe('');
  expect(run.code).toBe(0);
  const lines = run.stdout.trim().split('\n');
  expect(lines).toHaveLength(1);
  return JSON.parse(lines[0]) as Record<string, unknown>;
}

/** A JSON type as the contracts state it. */
export type JsonType = 'number' | 'string' | 'boolean' | 'array' | 'object' | 'number|null' | 'object|null' | 'string|null';

/** Asserts that each named field exists with the stated type (finite numbers only). */
export function expectFields(value: unknown, fields: Record<string, JsonType>): void {
  expect(value).toBeTypeOf('object');
  const obj = value as Record<string, unknown>;
  for (const [key, type] of Object.entries(fields)) {
    expect(obj, `field ${key}`).toHaveProperty(key);
    const v = obj[key];
    const nullable = type.endsWith('|null');
    if (nullable && v === null) continue;
    const base = type.replace('|null', '');
    if (base === 'array') expect(Array.isArray(v), `${key} is an array`).toBe(true);
    else if (base === 'object') expect(v !== null && typeof v === 'object' && !Array.isArray(v), `${key} is an object`).toBe(true);
    else expect(typeof v, `${key} is a ${base}`).toBe(base);
    if (base === 'number') expect(Number.isFinite(v), `${key} is finite`).toBe(true);
  }
}

/** Runs a command that must fail on bad input: exit 2, nothing on stdout, the field named on stderr. */
export async function expectBadInput(field: RegExp, ...args: string[]): Promise<void> {
  const run = await runCli(...args);
  expect(run.code).toBe(2);
  expect(run.stdout).toBe('');
  expect(run.stderr).toMatch(field);
}
