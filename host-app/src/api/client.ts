import type { ApiError } from '@covalent/shared-types';
import { ApiRequestError } from './ApiRequestError';

export { ApiRequestError } from './ApiRequestError';

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

const UNREACHABLE: ApiError = {
  ok: false,
  error: 'network_unreachable',
  message: 'The Covalent server could not be reached. Check the connection and try again.',
};

function isApiError(value: unknown): value is ApiError {
  if (typeof value !== 'object' || value === null) return false;
  const v = value as Record<string, unknown>;
  return v.ok === false && typeof v.error === 'string' && typeof v.message === 'string';
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/** A proxy or crash page is not an ApiError; give the teacher a sentence anyway. */
function fallbackError(status: number): ApiError {
  return {
    ok: false,
    error: 'unexpected_response',
    message: `The server answered with an unexpected error (HTTP ${status}). Try again in a moment.`,
  };
}

async function request<T>(method: Method, path: string, body?: unknown): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  // A FormData body sets its own multipart boundary; only JSON needs the header.
  const isForm = body instanceof FormData;
  if (body !== undefined && !isForm) headers['Content-Type'] = 'application/json';

  let response: Response;
  try {
    response = await fetch(path, {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
    });
  } catch {
    throw new ApiRequestError(0, UNREACHABLE);
  }

  const payload = await readJson(response);
  if (!response.ok) {
    throw new ApiRequestError(response.status, isApiError(payload) ? payload : fallbackError(response.status));
  }
  return payload as T;
}

/** The one way the teacher app talks to the REST API. Cookies carry the session. */
export const apiClient = {
  get: <T>(path: string): Promise<T> => request<T>('GET', path),
  post: <T>(path: string, body?: unknown): Promise<T> => request<T>('POST', path, body),
  patch: <T>(path: string, body?: unknown): Promise<T> => request<T>('PATCH', path, body),
  put: <T>(path: string, body?: unknown): Promise<T> => request<T>('PUT', path, body),
  delete: <T>(path: string): Promise<T> => request<T>('DELETE', path),
  /** A multipart POST (file uploads, CSV imports). */
  upload: <T>(path: string, form: FormData): Promise<T> => request<T>('POST', path, form),
};
