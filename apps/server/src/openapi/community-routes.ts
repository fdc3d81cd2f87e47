import * as z from 'zod';
import * as c from '@barwright/contracts';
import { EXPORT_QUERY_SCHEMA } from '../designs/export-query';
import type { OpenApiRoute } from './openapi-document';

/** The community's routes (publishing, Explore, ratings, comments, remix, shop log, notifications). */
export const COMMUNITY_ROUTES: OpenApiRoute[] = [
  { method: 'post', path: '/api/designs/{id}/publish', summary: 'Publish the design as a new immutable revision (editor)', tag: 'community', body: c.publishBody, status: 201 },
  { method: 'get', path: '/api/designs/{id}/entry', summary: 'The entry a board design was published as, or null if never', tag: 'community', answer: c.designEntryLinkAnswerSchema },
  { method: 'get', path: '/api/entries', summary: 'Explore: filters, full-text search, sorts, pages', tag: 'community', query: c.exploreQuery },
  { method: 'get', path: '/api/entries/{id}', summary: 'A published bar: latest revision, history, rating, counts', tag: 'community' },
  { method: 'delete', path: '/api/entries/{id}', summary: 'Delete your own published bar', tag: 'community', status: 204 },
  { method: 'get', path: '/api/entries/{id}/revisions/{n}', summary: 'One revision', tag: 'community' },
  { method: 'get', path: '/api/entries/{id}/thumbnail.svg', summary: 'Line-study thumbnail (SVG)', tag: 'community', file: 'an SVG drawing' },
  { method: 'get', path: '/api/entries/{id}/revisions/{n}/thumbnail.svg', summary: "A revision's thumbnail (SVG)", tag: 'community', file: 'an SVG drawing' },
  { method: 'get', path: '/api/entries/{id}/export', summary: 'Download a revision as PDF (pdf-pair: with the opposite blank), SVG, line-study SVG, DXF, G-code, CSV or the design file', tag: 'community', file: 'the exported file', query: EXPORT_QUERY_SCHEMA },
  { method: 'put', path: '/api/entries/{id}/rating', summary: 'Rate 1–5 stars (not your own)', tag: 'community', body: c.ratingBody },
  { method: 'delete', path: '/api/entries/{id}/rating', summary: 'Remove your rating', tag: 'community' },
  { method: 'get', path: '/api/entries/{id}/comments', summary: 'Comments, one level of replies', tag: 'community' },
  { method: 'post', path: '/api/entries/{id}/comments', summary: 'Comment or reply (rate limited)', tag: 'community', body: c.newCommentBody, status: 201 },
  { method: 'patch', path: '/api/comments/{id}', summary: 'Edit your comment within the edit window', tag: 'community', body: c.editCommentBody },
  { method: 'delete', path: '/api/comments/{id}', summary: 'Delete your comment', tag: 'community', status: 204 },
  { method: 'post', path: '/api/entries/{id}/remix', summary: 'Copy the latest revision onto one of your boards', tag: 'community', body: c.remixBody, status: 201 },
  { method: 'get', path: '/api/entries/{id}/lineage', summary: 'Ancestors, siblings and descendants', tag: 'community' },
  { method: 'get', path: '/api/entries/{id}/remixes', summary: 'Published remixes', tag: 'community' },
  { method: 'get', path: '/api/entries/{id}/changes', summary: 'What changed against the parent, field by field', tag: 'community' },
  { method: 'post', path: '/api/entries/{id}/photos', summary: 'Add a shop-log photo (multipart field `photo`)', tag: 'shop log', status: 201 },
  { method: 'post', path: '/api/designs/{id}/photos', summary: "Add a photo to a board's design (editor)", tag: 'shop log', status: 201 },
  { method: 'get', path: '/api/entries/{id}/photos', summary: "A published bar's shop log", tag: 'shop log' },
  { method: 'get', path: '/api/designs/{id}/photos', summary: "A board design's shop log (members)", tag: 'shop log' },
  { method: 'get', path: '/api/photos/{id}', summary: 'The re-encoded photo', tag: 'shop log', file: 'a JPEG, PNG or WebP image' },
  { method: 'get', path: '/api/photos/{id}/thumb', summary: 'Its thumbnail', tag: 'shop log', file: 'a JPEG, PNG or WebP image' },
  { method: 'delete', path: '/api/photos/{id}', summary: 'Remove your photo', tag: 'shop log', status: 204 },
  { method: 'post', path: '/api/rosettes/measured/preview', summary: 'Check a measured rosette table (CSV of angle, radius)', tag: 'shop log' },
  { method: 'get', path: '/api/notifications', summary: 'Your notifications and unread count', tag: 'notifications' },
  { method: 'post', path: '/api/notifications/read', summary: 'Mark some or all read', tag: 'notifications' },
  { method: 'get', path: '/api/notifications/settings', summary: 'E-mail settings', tag: 'notifications', answer: c.notificationSettings },
  { method: 'put', path: '/api/notifications/settings', summary: 'Change e-mail settings', tag: 'notifications', body: c.notificationSettings, answer: c.notificationSettings },
  { method: 'get', path: '/api/notifications/unsubscribe', summary: 'One-click unsubscribe from a mailed link (no sign-in)', tag: 'notifications', query: z.object({ token: z.string() }) },
];
