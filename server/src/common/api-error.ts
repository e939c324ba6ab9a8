import { HttpException, HttpStatus } from '@nestjs/common';
import type { ApiError } from '@covalent/shared-types';

/** Throw this anywhere to answer with the one error shape and a stable code. */
export class ApiException extends HttpException {
  constructor(status: HttpStatus, code: string, message: string, details?: ApiError['details']) {
    const body: ApiError = { ok: false, error: code, message, ...(details ? { details } : {}) };
    super(body, status);
  }
}

const DEFAULT_CODES: Record<number, string> = {
  400: 'bad_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  405: 'method_not_allowed',
  409: 'conflict',
  413: 'payload_too_large',
  415: 'unsupported_media_type',
  422: 'unprocessable',
  429: 'rate_limited',
};

/** Turns any thrown value into the one error shape; unknown errors become a 500 without internals. */
export function toApiError(err: unknown): { status: number; body: ApiError } {
  if (err instanceof HttpException) {
    const status = err.getStatus();
    const res = err.getResponse();
    if (typeof res === 'object' && res !== null && (res as ApiError).ok === false) {
      return { status, body: res as ApiError };
    }
    const raw = typeof res === 'string' ? res : (res as { message?: unknown }).message;
    const message = Array.isArray(raw) ? raw.join('; ') : typeof raw === 'string' ? raw : err.message;
    return { status, body: { ok: false, error: DEFAULT_CODES[status] ?? 'error', message } };
  }
  // Errors raised by Express middleware (body-parser) carry a status and a type.
  const e = err as { status?: number; statusCode?: number; type?: string };
  const status = e?.status ?? e?.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    if (e.type === 'entity.too.large') {
      return { status: 413, body: { ok: false, error: 'payload_too_large', message: 'The request body is too large.' } };
    }
    if (e.type === 'entity.parse.failed') {
      return { status: 400, body: { ok: false, error: 'malformed_json', message: 'The request body is not valid JSON.' } };
    }
    return { status, body: { ok: false, error: DEFAULT_CODES[status] ?? 'bad_request', message: 'The request could not be read.' } };
  }
  return {
    status: HttpStatus.INTERNAL_SERVER_ERROR,
    body: { ok: false, error: 'internal', message: 'Something went wrong on the server. Nothing was changed.' },
  };
}
