import path from 'node:path';
import { z } from 'zod';

const bool = z.enum(['true', 'false', '1', '0']).transform((v) => v === 'true' || v === '1');

const envSchema = z.object({
  PORT: z.coerce.number().int().min(0).max(65535).default(3000),
  HOST: z.string().default('0.0.0.0'),
  DATA_DIR: z.string().min(1).default('./data'),
  DATABASE_URL: z.url().optional(),
  SMTP_URL: z.url().optional(),
  MAIL_FROM: z.string().default('Barwright <no-reply@barwright.example>'),
  SESSION_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
  PUBLIC_URL: z.url().optional(),
  NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
  DEMO_DATA: bool.default(true),
  WEB_DIST: z.string().optional(),
});

export interface Config {
  port: number;
  host: string;
  dataDir: string;
  databaseUrl?: string;
  smtpUrl?: string;
  mailFrom: string;
  sessionSecret?: string;
  publicUrl: string;
  nodeEnv: 'development' | 'production' | 'test';
  demoData: boolean;
  webDist: string;
}

/** Parses the environment once; a bad value stops the start with the variable named. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join('.')}: ${i.message}`);
    throw new Error(`Invalid configuration:\n${lines.join('\n')}`);
  }
  const e = parsed.data;
  if (e.NODE_ENV === 'production' && !e.SESSION_SECRET) {
    throw new Error('Invalid configuration:\n  SESSION_SECRET: is required when NODE_ENV=production (at least 32 characters)');
  }
  return {
    port: e.PORT,
    host: e.HOST,
    dataDir: path.resolve(e.DATA_DIR),
    databaseUrl: e.DATABASE_URL,
    smtpUrl: e.SMTP_URL,
    mailFrom: e.MAIL_FROM,
    sessionSecret: e.SESSION_SECRET,
    publicUrl: (e.PUBLIC_URL ?? `http://localhost:${e.PORT}`).replace(/\/$/, ''),
    nodeEnv: e.NODE_ENV,
    demoData: e.DEMO_DATA,
    webDist: path.resolve(e.WEB_DIST ?? 'dist/web/browser'),
  };
}
