import { describe, expect, it } from 'vitest';
import { loadConfig } from './config';

describe('configuration', () => {
  it('has defaults that run the product locally', () => {
    const c = loadConfig({});
    expect(c).toMatchObject({ port: 3000, publicUrl: 'http://localhost:3000', nodeEnv: 'development', demoData: true });
    expect(c.databaseUrl).toBeUndefined();
    expect(c.smtpUrl).toBeUndefined();
  });

  it('names the variable that is wrong', () => {
    expect(() => loadConfig({ PORT: 'eighty' })).toThrow(/PORT/);
    expect(() => loadConfig({ DATABASE_URL: 'not a url' })).toThrow(/DATABASE_URL/);
    expect(() => loadConfig({ SESSION_SECRET: 'short' })).toThrow(/SESSION_SECRET: must be at least 32/);
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET: is required/);
  });

  it('takes PUBLIC_URL without a trailing slash', () => {
    expect(loadConfig({ PUBLIC_URL: 'https://turners.example/' }).publicUrl).toBe('https://turners.example');
  });
});
