import { HttpEventType, HttpHeaderResponse, HttpResponse } from '@angular/common/http';
import { describe, expect, it } from 'vitest';
import { ApiError } from '../../core/http/api-error';
import { fileProblem, uploadRefusal, uploadStep } from './upload-progress';

describe('uploadStep', () => {
  it('turns upload progress into a fraction of the bytes sent', () => {
    expect(uploadStep({ type: HttpEventType.UploadProgress, loaded: 250, total: 1000 })).toEqual({ kind: 'sending', fraction: 0.25 });
    expect(uploadStep({ type: HttpEventType.UploadProgress, loaded: 250 })).toEqual({ kind: 'sending', fraction: null });
  });

  it('hands over the server’s answer and ignores the other events', () => {
    expect(uploadStep(new HttpResponse({ body: { id: 'p1' }, status: 201 }))).toEqual({ kind: 'done', body: { id: 'p1' } });
    expect(uploadStep({ type: HttpEventType.Sent })).toBeNull();
    expect(uploadStep(new HttpHeaderResponse({ status: 201 }))).toBeNull();
  });
});

describe('fileProblem', () => {
  it('refuses a file above 10 MB before sending it', () => {
    expect(fileProblem({ size: 12 * 1024 * 1024, type: 'image/jpeg' })).toBe('The file is 12.0 MB; the limit is 10 MB.');
  });

  it('refuses a file announced as another type, and leaves an unknown type to the server', () => {
    expect(fileProblem({ size: 1000, type: 'image/gif' })).toBe('Choose a JPEG, PNG or WebP photo.');
    expect(fileProblem({ size: 1000, type: '' })).toBeNull();
    expect(fileProblem({ size: 1000, type: 'image/webp' })).toBeNull();
  });
});

describe('uploadRefusal', () => {
  it('gives the server’s reason for size, type, pixels and the daily count', () => {
    for (const [status, code] of [[413, 'too_large'], [415, 'unsupported_type'], [422, 'too_many_pixels'], [429, 'rate_limited']] as const) {
      expect(uploadRefusal(new ApiError(status, code, `reason ${status}`))).toBe(`reason ${status}`);
    }
  });

  it('names the fields of a refused form', () => {
    expect(uploadRefusal(new ApiError(400, 'invalid_input', 'Check', { date: 'must not be in the future' }))).toBe('Date must not be in the future.');
  });

  it('leaves an ended session and server faults to the app’s error handler', () => {
    expect(() => uploadRefusal(new ApiError(401, 'unauthenticated', 'x'))).toThrow();
    expect(() => uploadRefusal(new ApiError(500, 'server_error', 'x'))).toThrow();
    expect(uploadRefusal(new ApiError(0, 'network', 'x'))).toMatch(/did not reach/);
  });
});
