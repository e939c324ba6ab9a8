import type { ApiError } from '@covalent/shared-types';

/** A failed API call: the HTTP status (0 when the server was not reached) and the server's error body. */
export class ApiRequestError extends Error {
  readonly status: number;
  readonly body: ApiError;

  constructor(status: number, body: ApiError) {
    super(body.message);
    this.name = 'ApiRequestError';
    this.status = status;
    this.body = body;
  }

  /** The server's stable code, e.g. `invalid_credentials`. */
  get code(): string {
    return this.body.error;
  }

  /** Messages the server attached to one input field. */
  fieldMessages(field: string): string[] {
    return (this.body.details ?? []).filter((d) => d.field === field).map((d) => d.message);
  }
}
