/**
 * How the API reports failure: every error is JSON `{ error: { field, message, problems, issues } }`.
 * Bad input (InputError / InputRangeError from sim/ or the scenario loader, request validation) is
 * 400 naming the field and the allowed range; an oversized body is 413; unknown routes 404; anything
 * else is 500 with a fixed message (the detail goes to the server's log, never to the client).
 */
import type { ErrorRequestHandler, RequestHandler } from 'express';
import { InputError, InputRangeError } from '../../sim/errors.js';

/** One problem with a request: the field (dotted path in the request body) and what is wrong. */
export interface Issue {
  field: string;
  message: string;
}

/** The JSON body of every error response. */
export interface ErrorBody {
  error: {
    /** The first offending field, as a dotted path in the request body ('' when none applies). */
    field: string;
    /** The first problem in words, starting with the field. */
    message: string;
    /** Every problem found, each "field: message". */
    problems: string[];
    /** The same problems as { field, message } pairs. */
    issues: Issue[];
  };
}

/** An error with an HTTP status and the fields it concerns. */
export class HttpError extends Error {
  readonly status: number;
  readonly issues: Issue[];
  constructor(status: number, issues: Issue[]) {
    const first = issues[0] ?? { field: '', message: 'request failed' };
    super(first.field ? `${first.field}: ${first.message}` : first.message);
    this.name = 'HttpError';
    this.status = status;
    this.issues = issues.length > 0 ? issues : [first];
  }
}

/** Splits a "field: message" problem line into its parts (the scenario loader's format). */
export function issueFromProblem(problem: string): Issue {
  const at = problem.indexOf(': ');
  return at < 0 ? { field: '', message: problem } : { field: problem.slice(0, at), message: problem.slice(at + 2) };
}

/** Renders issues as the error body. */
export function errorBody(issues: Issue[]): ErrorBody {
  const problems = issues.map((i) => (i.field ? `${i.field}: ${i.message}` : i.message));
  return { error: { field: issues[0]?.field ?? '', message: problems[0] ?? 'request failed', problems, issues } };
}

/** Renames a sim/ field to its place in the request body (e.g. observerHeight_m → scenario.observer.height_m). */
export type FieldMap = (field: string) => string;

/**
 * Converts a thrown input error to an HttpError(400) with the field named as in the request body.
 * Returns null for anything that is not the user's fault.
 */
export function inputErrorToHttp(error: unknown, mapField: FieldMap = (f) => f): HttpError | null {
  if (error instanceof HttpError) return error;
  if (error instanceof InputError) {
    const problems = (error as InputError & { problems?: string[] }).problems ?? [error.message];
    return new HttpError(400, problems.map(issueFromProblem).map((i) => ({ field: mapField(i.field), message: i.message })));
  }
  if (error instanceof InputRangeError) {
    const message = error.message.startsWith(`${error.field} = `) ? error.message.slice(error.field.length + 3) : error.message;
    return new HttpError(400, [{ field: mapField(error.field), message }]);
  }
  return null;
}

/** Body-parser failures (malformed JSON, oversized body) as HttpErrors. */
function parserError(error: unknown, bodyLimit_bytes: number): HttpError | null {
  const type = (error as { type?: unknown })?.type;
  if (type === 'entity.too.large') {
    return new HttpError(413, [{ field: 'body', message: `request body is too large: allowed at most ${bodyLimit_bytes} bytes` }]);
  }
  if (type === 'entity.parse.failed') {
    return new HttpError(400, [{ field: 'body', message: 'request body is not valid JSON' }]);
  }
  if (type === 'encoding.unsupported' || type === 'charset.unsupported') {
    return new HttpError(415, [{ field: 'body', message: 'request body must be UTF-8 JSON' }]);
  }
  if (typeof type === 'string' && typeof (error as { status?: unknown }).status === 'number') {
    return new HttpError(400, [{ field: 'body', message: 'request body could not be read' }]);
  }
  return null;
}

/** Where internal errors are written (the server's own log; default stderr). */
export type ErrorLog = (message: string) => void;

/** The error middleware: JSON for every failure, no stack traces to clients. */
export function errorHandler(bodyLimit_bytes: number, log: ErrorLog): ErrorRequestHandler {
  return (error, req, res, _next) => {
    const known = parserError(error, bodyLimit_bytes) ?? inputErrorToHttp(error);
    if (known) {
      res.status(known.status).json(errorBody(known.issues));
      return;
    }
    log(`internal error on ${req.method} ${req.path}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
    res.status(500).json(errorBody([{ field: '', message: 'internal error: the server could not compute this; the details are in its log' }]));
  };
}

/** Unknown routes: 404 in JSON. */
export const notFound: RequestHandler = (req, res) => {
  res.status(404).json(errorBody([{ field: '', message: `no such route: ${req.method} ${req.path}` }]));
};
