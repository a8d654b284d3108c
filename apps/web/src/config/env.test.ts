import { describe, expect, it } from 'vitest';
import { globalConfig } from 'zod/v4/core';
import { readEnv } from './env';

describe('client configuration', () => {
  it('defaults the API base to /api and trims a trailing slash', () => {
    expect(readEnv({}).apiBaseUrl).toBe('/api');
    expect(readEnv({ VITE_API_BASE_URL: 'https://club.example/api/' }).apiBaseUrl).toBe(
      'https://club.example/api',
    );
  });

  it('refuses a base that is neither a path nor an http(s) URL', () => {
    expect(() => readEnv({ VITE_API_BASE_URL: 'ftp://x' })).toThrow(/VITE_API_BASE_URL/);
    expect(() => readEnv({ VITE_API_BASE_URL: 42 })).toThrow(/VITE_API_BASE_URL/);
  });

  // script-src 'self' forbids new Function: zod must never try its JIT in the browser.
  it('turns zod’s JIT off for every later parse', () => {
    expect(globalConfig.jitless).toBe(true);
  });
});
