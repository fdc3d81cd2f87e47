import { describe, expect, it } from 'vitest';
import { configWarnings, loadConfig } from './config';

const secret = 'x'.repeat(32);
const production = { NODE_ENV: 'production', SESSION_SECRET: secret, SMTP_URL: 'smtp://mail.example:587' };

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

  it('refuses a production start without SMTP_URL: no fake mail server, no mailbox', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: secret })).toThrow(/SMTP_URL: is required when NODE_ENV=production/);
    expect(loadConfig(production).smtpUrl).toBe('smtp://mail.example:587');
  });

  it('asks the command-line tools (admin, seed) for neither SESSION_SECRET nor SMTP_URL: they sign no cookie and send no mail', () => {
    expect(loadConfig({ NODE_ENV: 'production' }, { serving: false }).nodeEnv).toBe('production');
  });

  it('seeds the demo accounts in production only when DEMO_DATA=true is set, and then warns', () => {
    expect(loadConfig(production).demoData).toBe(false);
    expect(configWarnings(loadConfig(production))).toEqual([]);
    const asked = loadConfig({ ...production, DEMO_DATA: 'true' });
    expect(asked.demoData).toBe(true);
    expect(configWarnings(asked).join('\n')).toMatch(/WARNING: DEMO_DATA=true in production/);
    expect(loadConfig({ DEMO_DATA: 'false' }).demoData).toBe(false);
    expect(configWarnings(loadConfig({}))).toEqual([]);
  });

  it('asks for SESSION_SECRET with DATABASE_URL (instances must sign cookies alike) and reads REDIS_URL and TRUST_PROXY', () => {
    const url = 'postgres://db.example/barwright';
    expect(() => loadConfig({ DATABASE_URL: url })).toThrow(/SESSION_SECRET: is required when DATABASE_URL is set/);
    expect(loadConfig({ DATABASE_URL: url }, { serving: false }).databaseUrl).toBe(url);
    const c = loadConfig({ DATABASE_URL: url, SESSION_SECRET: secret, REDIS_URL: 'redis://127.0.0.1:6379' });
    expect(c).toMatchObject({ redisUrl: 'redis://127.0.0.1:6379', trustProxy: false });
    expect(() => loadConfig({ REDIS_URL: 'http://127.0.0.1:6379' })).toThrow(/REDIS_URL: must be a redis/);
    expect(loadConfig({ TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(loadConfig({ TRUST_PROXY: 'true' }).trustProxy).toBe(true);
    expect(loadConfig({ TRUST_PROXY: 'loopback, 10.0.0.0/8' }).trustProxy).toBe('loopback, 10.0.0.0/8');
    expect(() => loadConfig({ TRUST_PROXY: 'a;b' })).toThrow(/TRUST_PROXY/);
    expect(loadConfig({}).redisPrefix).toBe('barwright');
    expect(() => loadConfig({ REDIS_PREFIX: 'a b' })).toThrow(/REDIS_PREFIX/);
  });

  it('takes PUBLIC_URL without a trailing slash', () => {
    expect(loadConfig({ PUBLIC_URL: 'https://turners.example/' }).publicUrl).toBe('https://turners.example');
  });
});
