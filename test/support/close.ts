/**
 * One shared "close enough" assertion (STYLE.md §10): compares numbers, arrays and plain objects
 * recursively, and on failure prints the path, wanted, got, absolute and relative error.
 */
import { expect } from 'vitest';

export interface Tolerance {
  /** Absolute tolerance (same unit as the values). */
  abs?: number;
  /** Relative tolerance (dimensionless). */
  rel?: number;
}

function describe(path: string, want: number, got: number): string {
  const absErr = Math.abs(got - want);
  const relErr = want === 0 ? Infinity : absErr / Math.abs(want);
  return `${path || 'value'}: want ${want}, got ${got}, abs error ${absErr.toExponential(3)}, rel error ${relErr.toExponential(3)}`;
}

function check(want: unknown, got: unknown, tol: Tolerance, path: string, failures: string[]): void {
  if (typeof want === 'number') {
    if (typeof got !== 'number' || !Number.isFinite(got)) {
      failures.push(`${path || 'value'}: want ${want}, got ${String(got)}`);
      return;
    }
    const absErr = Math.abs(got - want);
    const limit = Math.max(tol.abs ?? 0, (tol.rel ?? 0) * Math.abs(want));
    if (!(absErr <= limit)) failures.push(describe(path, want, got));
    return;
  }
  if (Array.isArray(want) || ArrayBuffer.isView(want)) {
    const w = want as ArrayLike<unknown>;
    const g = got as ArrayLike<unknown>;
    if (!g || g.length !== w.length) {
      failures.push(`${path}: want length ${w.length}, got ${g ? g.length : String(g)}`);
      return;
    }
    for (let i = 0; i < w.length; i++) check(w[i], g[i], tol, `${path}[${i}]`, failures);
    return;
  }
  if (want && typeof want === 'object') {
    for (const key of Object.keys(want)) {
      check((want as Record<string, unknown>)[key], (got as Record<string, unknown>)?.[key], tol, path ? `${path}.${key}` : key, failures);
    }
    return;
  }
  if (want !== got) failures.push(`${path}: want ${String(want)}, got ${String(got)}`);
}

/** Asserts that got matches want within the tolerance; reports every mismatching component. */
export function expectClose(got: unknown, want: unknown, tol: Tolerance): void {
  if (tol.abs === undefined && tol.rel === undefined) throw new Error('expectClose needs abs or rel');
  const failures: string[] = [];
  check(want, got, tol, '', failures);
  expect(failures, failures.join('\n')).toEqual([]);
}
