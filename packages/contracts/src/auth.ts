import * as z from 'zod';
import { unitsSchema } from './design';

/** Request bodies and answers of the account and admin routes. */

export const ROLES = ['member', 'moderator', 'admin'] as const;
export const roleSchema = z.enum(ROLES, { error: `must be one of ${ROLES.join(', ')}` });
export type Role = z.infer<typeof roleSchema>;

export const PASSWORD_MIN = 12;
export const PASSWORD_MAX = 128;
export const DISPLAY_NAME_MAX = 60;
export const EMAIL_MAX = 254;

export const emailSchema = z
  .string({ error: 'is required' })
  .trim()
  .min(1, 'is required')
  .max(EMAIL_MAX, `must be at most ${EMAIL_MAX} characters`)
  .pipe(z.email({ error: 'must be an e-mail address' }))
  .transform((e) => e.toLowerCase());

/** Length only; the server also refuses common and guessable passwords. */
export const passwordSchema = z
  .string({ error: 'is required' })
  .min(PASSWORD_MIN, `must be at least ${PASSWORD_MIN} characters`)
  .max(PASSWORD_MAX, `must be at most ${PASSWORD_MAX} characters`);

export const displayNameSchema = z
  .string({ error: 'is required' })
  .trim()
  .min(1, 'is required')
  .max(DISPLAY_NAME_MAX, `must be at most ${DISPLAY_NAME_MAX} characters`);

export const signUpBody = z.strictObject({ email: emailSchema, password: passwordSchema, displayName: displayNameSchema });
export type SignUpBody = z.input<typeof signUpBody>;

export const signInBody = z.strictObject({
  email: emailSchema,
  password: z.string({ error: 'is required' }).min(1, 'is required').max(PASSWORD_MAX, `must be at most ${PASSWORD_MAX} characters`),
});
export type SignInBody = z.input<typeof signInBody>;

export const tokenSchema = z.string({ error: 'is required' }).min(16, 'is not a valid link').max(200, 'is not a valid link');
export const verifyBody = z.strictObject({ token: tokenSchema });
export const resetRequestBody = z.strictObject({ email: emailSchema });
export const resetConfirmBody = z.strictObject({ token: tokenSchema, password: passwordSchema });
export const resendVerificationBody = z.strictObject({});

export const updateProfileBody = z
  .strictObject({ displayName: displayNameSchema.optional(), units: unitsSchema.optional() })
  .refine((b) => b.displayName !== undefined || b.units !== undefined, { message: 'give displayName or units' });
export type UpdateProfileBody = z.input<typeof updateProfileBody>;

/** The signed-in account (`POST /api/auth/sign-in`, `PATCH /api/auth/me`). */
export const meSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  emailVerified: z.boolean(),
  units: unitsSchema,
});
export type Me = z.infer<typeof meSchema>;
/** `GET /api/auth/me`: 200 with the signed-in account, or 200 with null for a visitor (not an error). */
export const meAnswerSchema = meSchema.nullable();
export type MeAnswer = z.infer<typeof meAnswerSchema>;

/** A row of `GET /api/admin/users`. */
export const adminUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  emailVerified: z.boolean(),
  suspended: z.boolean(),
  createdAt: z.string(),
  lastSignInAt: z.string().nullable(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

/** Longest reason an admin may give for a change of role or suspension (it goes into the audit log). */
export const ADMIN_REASON_MAX = 500;
/**
 * `PATCH /api/admin/users/:id`. `reason` goes into the audit log; `undo: true` marks a change that
 * puts back what the admin's previous change did (the People page's Undo), and is audited as such.
 */
export const adminUpdateUserBody = z
  .strictObject({
    role: roleSchema.optional(),
    suspended: z.boolean({ error: 'must be true or false' }).optional(),
    reason: z.string({ error: 'must be text' }).trim().max(ADMIN_REASON_MAX, `must be at most ${ADMIN_REASON_MAX} characters`).optional(),
    undo: z.literal(true, { error: 'must be true when given' }).optional(),
  })
  .refine((b) => b.role !== undefined || b.suspended !== undefined, { message: 'give role or suspended' });
export type AdminUpdateUserBody = z.input<typeof adminUpdateUserBody>;

/** A message kept by the local fake SMTP server, `GET /api/dev/mailbox`. */
export const mailboxMessageSchema = z.object({
  id: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  html: z.string(),
  sentAt: z.string(),
});
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;

/** `GET /api/health`. */
export const healthSchema = z.object({ status: z.literal('ok'), database: z.enum(['pglite', 'postgres']) });
export type Health = z.infer<typeof healthSchema>;
/** `GET /api/health/ready`: 200 `ready` when every dependency answers; 503 `unavailable` or, while shutting down, `draining`. */
export const readinessSchema = z.object({
  status: z.enum(['ready', 'unavailable', 'draining']),
  checks: z.record(z.string(), z.object({ ok: z.boolean(), ms: z.number(), error: z.string().optional() })),
});
export type Readiness = z.infer<typeof readinessSchema>;

/** `GET /api/config`: what the web app needs to know about the server it talks to. */
export const clientConfigSchema = z.object({ localMail: z.boolean(), demo: z.boolean() });
export type ClientConfig = z.infer<typeof clientConfigSchema>;
