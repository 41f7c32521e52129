import { ZodError } from 'zod';

export interface IssueDetail {
  path: string;
  message: string;
}

/** An error the caller can act on; it becomes the API's one JSON error answer (DEVELOPERS.md, "The flow of a request"). */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: IssueDetail[] = [],
    readonly extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const invalid = (message: string, issues: IssueDetail[] = []) => new AppError(400, 'invalid', message, issues);
export const unauthorized = (message = 'Sign in to do this.') => new AppError(401, 'unauthorized', message);
export const forbidden = (message = 'Your role in this workspace does not allow this.') => new AppError(403, 'forbidden', message);
export const notFound = (what = 'That') => new AppError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, extra: Record<string, unknown> = {}) => new AppError(409, 'conflict', message, [], extra);
export const tooLarge = (limitBytes: number) =>
  new AppError(413, 'too_large', `The request body is larger than ${Math.round(limitBytes / 1024)} kB.`);
export const unsupportedMedia = (expected: string) => new AppError(415, 'unsupported_media_type', `Send the body as ${expected}.`);
export const rateLimited = (message: string, retryAfterS: number) => new AppError(429, 'rate_limited', message, [], { retryAfterS });
export const unavailable = () =>
  new AppError(503, 'unavailable', 'The database is not answering right now. Nothing was changed; try again in a few seconds.');

/** Zod issues → `{ path: "paths.1.filter.order", message }`. */
export function zodIssues(error: ZodError, root = '(body)'): IssueDetail[] {
  return error.issues.map((issue) => ({
    path: issue.path.map(String).join('.') || root,
    message: issue.message,
  }));
}

export function fromZod(error: ZodError, root = '(body)'): AppError {
  const issues = zodIssues(error, root);
  const first = issues[0];
  const message = first ? `${first.path}: ${first.message}` : 'The request is not valid.';
  return invalid(issues.length > 1 ? `${message} (and ${issues.length - 1} more)` : message, issues);
}

const DB_DOWN = /SequelizeConnection|ConnectionRefused|ConnectionAcquireTimeout|HostNotReachable|ECONNREFUSED|ECONNRESET|Connection terminated|terminating connection|the database system is (starting up|shutting down)|timeout exceeded when trying to connect/i;

/** True for errors that mean PostgreSQL is not reachable (an outage, not a bug). */
export function isDatabaseDown(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  const parent = (error as { parent?: unknown; original?: unknown }).parent ?? (error as { original?: unknown }).original;
  return DB_DOWN.test(error.name) || DB_DOWN.test(error.message) || (parent instanceof Error && DB_DOWN.test(parent.message));
}

export function errorBody(error: AppError) {
  return {
    error: {
      code: error.code,
      message: error.message,
      ...(error.issues.length ? { issues: error.issues } : {}),
      ...error.extra,
    },
  };
}

/** Maps anything thrown to an AppError; unknown errors become a generic 500 (and are logged). */
export function toAppError(error: unknown): AppError {
  if (error instanceof AppError) return error;
  if (error instanceof ZodError) return fromZod(error);
  if (isDatabaseDown(error)) return unavailable();
  if (error instanceof RangeError) return invalid(error.message);
  console.error(error);
  return new AppError(500, 'internal', 'Something went wrong on our side. Nothing was changed.');
}
