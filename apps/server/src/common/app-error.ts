/** Stable error codes; the exception filter maps each to its HTTP status. */
export const ERROR_STATUS = {
  validation_failed: 400,
  bad_json: 400,
  invalid_credentials: 401,
  unauthorized: 401,
  session_expired: 401,
  forbidden: 403,
  not_found: 404,
  invite_not_found: 404,
  email_taken: 409,
  last_lead: 409,
  already_member: 409,
  conflict: 409,
  day_closed: 409,
  plan_refused: 422,
  load_too_big: 422,
  not_lifted: 409,
  bands_too_early: 409,
  bands_on: 409,
  reprocess_closed: 409,
  nothing_to_reprocess: 409,
  not_enough_jars: 422,
  payload_too_large: 413,
  file_too_large: 413,
  unsupported_file_type: 415,
  unreadable_image: 422,
  too_many_attempts: 429,
  internal: 500,
} as const;

export type ErrorCode = keyof typeof ERROR_STATUS;

/** A refusal the domain expects; its message is safe to show a person. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: { path: string; message: string }[],
  ) {
    super(message);
    this.name = 'AppError';
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} not found`);
export const forbidden = (message = 'Your role in this kitchen does not allow that') =>
  new AppError('forbidden', message);
