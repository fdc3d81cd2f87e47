import * as z from 'zod';
import * as c from '@barwright/contracts';
import type { OpenApiRoute } from './openapi-document';

const item = '/api/moderation/items/{kind}/{id}';

/** The moderation and showcase routes, for the OpenAPI document (the document and its spec list them beside the others). */
export const MODERATION_ROUTES: OpenApiRoute[] = [
  { method: 'get', path: '/api/showcase', summary: 'The showcase, in the curators’ order (anyone)', tag: 'showcase', answer: z.array(c.showcaseItemSchema) },
  { method: 'post', path: '/api/reports', summary: 'Report an entry, a comment or a photo (one open report per member and item; rate limited)', tag: 'moderation', body: c.newReportBody, answer: c.reportSchema, status: 201 },
  { method: 'get', path: '/api/moderation/queue', summary: 'Open reports grouped by item, the one waiting longest first (moderators)', tag: 'moderation', answer: c.moderationQueueSchema },
  { method: 'get', path: '/api/moderation/hidden', summary: 'Items hidden now (moderators)', tag: 'moderation', answer: c.hiddenListSchema },
  { method: 'get', path: item, summary: 'One item with its reports and history (moderators)', tag: 'moderation', answer: c.moderationCaseSchema },
  { method: 'post', path: `${item}/dismiss`, summary: 'Close the open reports without acting (moderators)', tag: 'moderation', body: c.dismissBody, answer: c.moderationCaseSchema },
  { method: 'post', path: `${item}/hide`, summary: 'Hide the item; the reason is shown to its author (moderators)', tag: 'moderation', body: c.hideBody, answer: c.moderationCaseSchema },
  { method: 'post', path: `${item}/restore`, summary: 'Show a hidden item again (moderators)', tag: 'moderation', body: c.restoreBody, answer: c.moderationCaseSchema },
  { method: 'post', path: `${item}/suspend-author`, summary: 'Suspend the item’s author (admins)', tag: 'moderation', body: c.suspendAuthorBody, answer: c.moderationCaseSchema },
  { method: 'get', path: '/api/moderation/showcase', summary: 'The showcase as curated, hidden entries flagged (moderators)', tag: 'showcase', answer: z.array(c.curatedItemSchema) },
  { method: 'post', path: '/api/moderation/showcase', summary: 'Feature an entry with a curator’s note (moderators)', tag: 'showcase', body: c.featureBody, answer: c.curatedItemSchema, status: 201 },
  { method: 'put', path: '/api/moderation/showcase/order', summary: 'Set the showcase’s order (moderators)', tag: 'showcase', body: c.showcaseOrderBody, answer: z.array(c.curatedItemSchema) },
  { method: 'patch', path: '/api/moderation/showcase/{entryId}', summary: 'Edit the curator’s note (moderators)', tag: 'showcase', body: c.showcaseNoteBody, answer: c.curatedItemSchema },
  { method: 'delete', path: '/api/moderation/showcase/{entryId}', summary: 'Take an entry out of the showcase (moderators)', tag: 'showcase', status: 204 },
  { method: 'get', path: '/api/moderation/audit', summary: 'The audit log, newest first, filtered (moderators)', tag: 'moderation', query: c.auditQuery, answer: c.auditPageSchema },
  { method: 'get', path: '/api/moderation/audit/actors', summary: 'Who appears in the audit log as actor (moderators)', tag: 'moderation', answer: c.auditActorsSchema },
];
