import { OpenAPIRegistry, OpenApiGeneratorV31, type RouteConfig } from '@asteasolutions/zod-to-openapi';
import * as z from 'zod';
import * as c from '@barwright/contracts';
import { EXPORT_QUERY_SCHEMA } from '../designs/export-query';
import { COMMUNITY_ROUTES } from './community-routes';
import { MODERATION_ROUTES } from './moderation-routes';
import { RACK_ROUTES } from './rack-routes';

/**
 * The OpenAPI 3.1 document of every route, generated from the contracts' zod schemas: request
 * bodies are the very schemas the routes parse with, answers the schemas their types come from.
 */
const errorSchema = z.object({
  error: z.object({ code: z.string(), message: z.string(), fields: z.record(z.string(), z.string()).optional() }),
});

type Method = RouteConfig['method'];
interface Route {
  method: Method;
  path: string;
  summary: string;
  tag: string;
  body?: z.ZodType;
  answer?: z.ZodType;
  status?: number;
  /** The answer is a file, not JSON. */
  file?: string;
  query?: z.ZodObject;
}

const ok = z.object({ ok: z.literal(true) });
const id = z.object({ id: z.string() });

export const ROUTES: Route[] = [
  { method: 'get', path: '/api/health', summary: 'Liveness: the process answers (touches nothing else)', tag: 'system', answer: c.healthSchema },
  { method: 'get', path: '/api/health/ready', summary: 'Readiness: the database (and Redis when configured) answer; 503 when not, or while shutting down', tag: 'system', answer: c.readinessSchema },
  { method: 'get', path: '/api/config', summary: 'What the web app needs to know about this server', tag: 'system', answer: c.clientConfigSchema },
  { method: 'get', path: '/api/openapi.json', summary: 'This document', tag: 'system' },
  { method: 'post', path: '/api/auth/sign-up', summary: 'Create an account; sends the verification mail', tag: 'accounts', body: c.signUpBody, answer: ok, status: 201 },
  { method: 'post', path: '/api/auth/verify', summary: 'Confirm an e-mail address with the mailed token', tag: 'accounts', body: c.verifyBody, answer: ok },
  { method: 'post', path: '/api/auth/resend-verification', summary: 'Send the verification mail again', tag: 'accounts', answer: ok, status: 202 },
  { method: 'post', path: '/api/auth/sign-in', summary: 'Sign in (rate limited per account and per address)', tag: 'accounts', body: c.signInBody, answer: c.meSchema },
  { method: 'post', path: '/api/auth/sign-out', summary: 'Sign out; the session ends on the server', tag: 'accounts', status: 204 },
  { method: 'get', path: '/api/auth/me', summary: 'The signed-in member, or null for a visitor', tag: 'accounts', answer: c.meAnswerSchema },
  { method: 'patch', path: '/api/auth/me', summary: 'Change display name or units', tag: 'accounts', body: c.updateProfileBody, answer: c.meSchema },
  { method: 'post', path: '/api/auth/password-reset/request', summary: 'Mail a reset link (202 whether or not the address is known)', tag: 'accounts', body: c.resetRequestBody, answer: ok, status: 202 },
  { method: 'post', path: '/api/auth/password-reset/confirm', summary: 'Choose a new password with the mailed token', tag: 'accounts', body: c.resetConfirmBody, answer: ok },
  { method: 'get', path: '/api/admin/users', summary: 'Every account (admins)', tag: 'admin', answer: z.array(c.adminUserSchema) },
  { method: 'patch', path: '/api/admin/users/{id}', summary: 'Change a role or suspend (admins)', tag: 'admin', body: c.adminUpdateUserBody, answer: c.adminUserSchema },
  { method: 'get', path: '/api/dev/mailbox', summary: 'Messages the local fake SMTP server received (local mail mode only)', tag: 'system', answer: z.array(c.mailboxMessageSchema) },
  { method: 'post', path: '/api/boards', summary: 'Create a board (you own it)', tag: 'boards', body: c.createBoardBody, answer: c.boardDetailSchema, status: 201 },
  { method: 'get', path: '/api/boards', summary: 'My boards and boards shared with me', tag: 'boards', answer: c.boardListSchema },
  { method: 'get', path: '/api/boards/{id}', summary: 'A board with members, invitations (owner) and designs', tag: 'boards', answer: c.boardDetailSchema },
  { method: 'patch', path: '/api/boards/{id}', summary: 'Rename or archive (owner)', tag: 'boards', body: c.updateBoardBody, answer: c.boardDetailSchema },
  { method: 'post', path: '/api/boards/{id}/invitations', summary: 'Invite by e-mail (owner)', tag: 'boards', body: c.inviteBody, answer: c.boardInvitationSchema, status: 201 },
  { method: 'delete', path: '/api/boards/{id}/invitations/{invitationId}', summary: 'Withdraw an invitation (owner)', tag: 'boards', status: 204 },
  { method: 'post', path: '/api/invitations/accept', summary: 'Accept an invitation addressed to you', tag: 'boards', body: c.acceptInvitationBody, answer: z.object({ boardId: z.string() }) },
  { method: 'patch', path: '/api/boards/{id}/members/{userId}', summary: "Change a member's role (owner)", tag: 'boards', body: c.memberRoleBody, answer: c.boardDetailSchema },
  { method: 'delete', path: '/api/boards/{id}/members/{userId}', summary: 'Remove a member (owner) or leave (yourself)', tag: 'boards', status: 204 },
  { method: 'post', path: '/api/boards/{id}/designs', summary: 'Create a bar design from a preset (editor)', tag: 'designs', body: c.createDesignBody, answer: id, status: 201 },
  { method: 'get', path: '/api/designs/{id}', summary: 'The current design file (validated)', tag: 'designs', answer: c.designSchema },
  { method: 'get', path: '/api/designs/{id}/meta', summary: 'Title, board and your role', tag: 'designs', answer: c.designMetaSchema },
  { method: 'patch', path: '/api/designs/{id}', summary: 'Rename (editor)', tag: 'designs', body: c.updateDesignBody, answer: c.designSummarySchema },
  { method: 'post', path: '/api/designs/{id}/duplicate', summary: 'Copy onto the same board (editor)', tag: 'designs', answer: id, status: 201 },
  { method: 'delete', path: '/api/designs/{id}', summary: 'Delete; kept 30 days and restorable (owner)', tag: 'designs', status: 204 },
  { method: 'post', path: '/api/designs/{id}/restore', summary: 'Bring back a deleted design (owner)', tag: 'designs', answer: c.designSummarySchema },
  { method: 'get', path: '/api/designs/{id}/export', summary: 'Download as PDF (pdf-pair: with the opposite blank), SVG, line-study SVG, DXF, G-code, CSV or the design file', tag: 'designs', file: 'the exported file', query: EXPORT_QUERY_SCHEMA.omit({ revision: true }) },
  { method: 'get', path: '/api/designs/{id}/versions', summary: 'Named versions, newest first', tag: 'designs', answer: z.array(c.designVersionSchema) },
  { method: 'post', path: '/api/designs/{id}/versions', summary: 'Save the current state as a named version (editor)', tag: 'designs', body: c.createVersionBody, answer: c.designVersionSchema, status: 201 },
  { method: 'get', path: '/api/designs/{id}/versions/{versionId}', summary: 'A version’s design file and notes, for comparing', tag: 'designs', answer: z.object({ design: z.record(z.string(), z.unknown()), notes: z.string() }) },
  { method: 'post', path: '/api/designs/{id}/versions/{versionId}/restore', summary: 'Restore a version as a new edit (editor)', tag: 'designs', answer: z.record(z.string(), z.unknown()) },
];

const pathParams = (path: string) => {
  const names = [...path.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
  return names.length ? z.object(Object.fromEntries(names.map((n) => [n, z.string()]))) : undefined;
};

/** Builds the document; `extra` lets later features add their routes without editing this list. */
export function openApiDocument(extra: Route[] = []) {
  const registry = new OpenAPIRegistry();
  registry.registerComponent('securitySchemes', 'session', { type: 'apiKey', in: 'cookie', name: 'barwright.sid' });
  for (const r of [...ROUTES, ...COMMUNITY_ROUTES, ...MODERATION_ROUTES, ...RACK_ROUTES, ...extra]) {
    const status = r.status ?? 200;
    const params = pathParams(r.path);
    registry.registerPath({
      method: r.method,
      path: r.path,
      summary: r.summary,
      tags: [r.tag],
      request: {
        ...(params ? { params } : {}),
        ...(r.query ? { query: r.query } : {}),
        ...(r.body ? { body: { content: { 'application/json': { schema: r.body } } } } : {}),
      },
      responses: {
        [status]: {
          description: r.file ?? (status === 204 ? 'done, no content' : 'success'),
          ...(r.answer ? { content: { 'application/json': { schema: r.answer } } } : {}),
        },
        default: { description: 'an error: 400 names the fields, 401 sign in, 403 not allowed or missing X-XSRF-TOKEN, 404, 409, 422, 429', content: { 'application/json': { schema: errorSchema } } },
      },
    });
  }
  return new OpenApiGeneratorV31(registry.definitions).generateDocument({
    openapi: '3.1.0',
    info: {
      title: 'Barwright API',
      version: '1',
      description: 'Unsafe methods need the X-XSRF-TOKEN header equal to the XSRF-TOKEN cookie. Realtime: y-websocket at /collab/{designId}.',
    },
  });
}

export type OpenApiRoute = Route;
