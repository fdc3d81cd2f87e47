import { HttpErrorResponse } from '@angular/common/http';
import type { ApiErrorBody } from '@barwright/contracts';

/**
 * The one error type the app sees for a failed API call.
 * 4xx: the user can fix the input or sign in. 5xx and status 0: try again later.
 */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    /** Dotted field path → message naming the limit (only on `invalid_input`). */
    readonly fields: Readonly<Record<string, string>> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }

  /** True when repeating the same request later may succeed (server fault or no answer). */
  get retryable(): boolean {
    return this.status === 0 || this.status >= 500;
  }

  static fromHttp(response: HttpErrorResponse): ApiError {
    const body = readErrorBody(response.error);
    if (response.status === 0) {
      return new ApiError(0, 'network', 'The Barwright server did not answer. Check the connection and try again.');
    }
    if (body) return new ApiError(response.status, body.code, body.message, body.fields ?? {});
    return new ApiError(response.status, fallbackCode(response.status), fallbackMessage(response.status));
  }
}

function readErrorBody(raw: unknown): ApiErrorBody['error'] | null {
  const parsed: unknown = typeof raw === 'string' ? safeJson(raw) : raw;
  if (typeof parsed !== 'object' || parsed === null || !('error' in parsed)) return null;
  const error = (parsed as { error: unknown }).error;
  if (typeof error !== 'object' || error === null) return null;
  const { code, message, fields } = error as Record<string, unknown>;
  if (typeof code !== 'string' || typeof message !== 'string') return null;
  return { code, message, fields: isStringRecord(fields) ? fields : undefined };
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

function isStringRecord(value: unknown): value is Record<string, string> {
  return typeof value === 'object' && value !== null && Object.values(value).every((v) => typeof v === 'string');
}

function fallbackCode(status: number): string {
  const codes: Record<number, string> = { 400: 'invalid_input', 401: 'unauthenticated', 403: 'forbidden', 404: 'not_found', 409: 'conflict', 429: 'rate_limited' };
  return codes[status] ?? (status >= 500 ? 'server_error' : 'request_failed');
}

function fallbackMessage(status: number): string {
  if (status === 429) return 'Too many attempts. Wait a minute and try again.';
  if (status >= 500) return 'The server ran into a problem. Try again in a moment.';
  return 'The request was refused.';
}
