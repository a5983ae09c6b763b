import { describe, expect, it } from 'vitest';

import { parseEnv } from './env';

describe('parseEnv(raw)', () => {
  it('applies the defaults when nothing is set', () => {
    expect(parseEnv({})).toEqual({ apiBaseUrl: '/api', requestTimeoutMs: 20_000 });
  });

  it('treats empty strings as not set', () => {
    expect(parseEnv({ VITE_API_BASE_URL: '', VITE_REQUEST_TIMEOUT_MS: '' })).toEqual({
      apiBaseUrl: '/api',
      requestTimeoutMs: 20_000,
    });
  });

  it('accepts an absolute URL and drops a trailing slash', () => {
    expect(parseEnv({ VITE_API_BASE_URL: 'https://polecourt.example.com/api/', VITE_REQUEST_TIMEOUT_MS: '5000' })).toEqual({
      apiBaseUrl: 'https://polecourt.example.com/api',
      requestTimeoutMs: 5000,
    });
  });

  it('names every bad variable in one error', () => {
    let message = '';
    try {
      parseEnv({ VITE_API_BASE_URL: 'api', VITE_REQUEST_TIMEOUT_MS: 'soon' });
    } catch (error) {
      message = (error as Error).message;
    }
    expect(message).toContain('VITE_API_BASE_URL');
    expect(message).toContain('VITE_REQUEST_TIMEOUT_MS');
  });
});
