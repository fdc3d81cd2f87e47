import { HttpErrorResponse } from '@angular/common/http';
import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';

const response = (status: number, error: unknown) => new HttpErrorResponse({ status, error, url: '/api/x' });

describe('ApiError.fromHttp', () => {
  it('reads the server error shape, field messages included', () => {
    const e = ApiError.fromHttp(response(400, { error: { code: 'invalid_input', message: 'Check the fields', fields: { 'rosette.layers.0.lobes': 'must be at least 1' } } }));
    expect(e).toMatchObject({ status: 400, code: 'invalid_input', message: 'Check the fields', retryable: false });
    expect(e.fields).toEqual({ 'rosette.layers.0.lobes': 'must be at least 1' });
  });

  it('reads a body that arrived as text', () => {
    const e = ApiError.fromHttp(response(401, JSON.stringify({ error: { code: 'invalid_credentials', message: 'No' } })));
    expect(e.code).toBe('invalid_credentials');
  });

  it('names a fallback code when a proxy answered without our shape', () => {
    expect(ApiError.fromHttp(response(429, '<html>slow down</html>')).code).toBe('rate_limited');
    expect(ApiError.fromHttp(response(502, null))).toMatchObject({ code: 'server_error', retryable: true });
  });

  it('treats no answer at all as retryable', () => {
    expect(ApiError.fromHttp(response(0, new Event('error')))).toMatchObject({ status: 0, code: 'network', retryable: true });
  });

  it('ignores a field map that is not strings only', () => {
    expect(ApiError.fromHttp(response(400, { error: { code: 'invalid_input', message: 'x', fields: { a: 1 } } })).fields).toEqual({});
  });
});
