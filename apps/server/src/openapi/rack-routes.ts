import * as z from 'zod';
import * as c from '@barwright/contracts';
import type { OpenApiRoute } from './openapi-document';

const id = z.object({ id: z.string() });

/** The rosette rack, saved sweeps, a shortlist sent to a board, and votes. */
export const RACK_ROUTES: OpenApiRoute[] = [
  { method: 'get', path: '/api/rack', summary: 'Your rack: rosettes and the rest of the shop, with your units', tag: 'rack' },
  { method: 'post', path: '/api/rack/rosettes', summary: 'Add a rosette to your rack (the design file’s rosette object)', tag: 'rack', body: c.rackRosetteBody(), status: 201 },
  { method: 'patch', path: '/api/rack/rosettes/{id}', summary: 'Change a rosette of your rack', tag: 'rack', body: c.rackRosettePatch() },
  { method: 'delete', path: '/api/rack/rosettes/{id}', summary: 'Delete a rosette of your rack', tag: 'rack', status: 204 },
  { method: 'put', path: '/api/rack/shop', summary: 'Rubbers, travel settings, end mills, followers and V-cutters', tag: 'rack', body: c.rackShopBody() },
  { method: 'get', path: '/api/rack/export', summary: `Your whole rack as one file (${c.RACK_FORMAT})`, tag: 'rack', file: 'the rack file (JSON)' },
  {
    method: 'post',
    path: '/api/rack/import',
    summary: `Import a rack file: replace your rack (default) or add its rosettes; all or nothing, 400 names the fields (at most ${c.RACK_FILE_MAX_BYTES / 1024 / 1024} MB and ${c.RACK_LIMITS.readings} measured readings)`,
    tag: 'rack',
    body: c.rackFileSchema,
    query: z.object({ mode: z.enum(['replace', 'add']).optional() }),
  },
  { method: 'get', path: '/api/rack/sweeps', summary: 'Your saved sweeps, newest first', tag: 'rack' },
  { method: 'post', path: '/api/rack/sweeps', summary: `Save a sweep's choices and shortlist (at most ${c.SWEEP_MAX_CANDIDATES} bars)`, tag: 'rack', body: c.sweepBody, status: 201 },
  { method: 'get', path: '/api/rack/sweeps/{id}', summary: 'A saved sweep', tag: 'rack' },
  { method: 'put', path: '/api/rack/sweeps/{id}', summary: 'Change a saved sweep', tag: 'rack', body: c.sweepBody },
  { method: 'delete', path: '/api/rack/sweeps/{id}', summary: 'Delete a saved sweep', tag: 'rack', status: 204 },
  { method: 'post', path: '/api/boards/{id}/designs/batch', summary: 'Create a shortlist as bar designs in one request, all or nothing (editor)', tag: 'designs', body: c.designsBatchBody, answer: z.object({ ids: z.array(z.string()) }), status: 201 },
  { method: 'post', path: '/api/boards/{id}/votes', summary: 'Open a vote over 3–30 designs of the board (editor; at most 20 a day a board, then 429)', tag: 'votes', body: c.createVoteBody, answer: id, status: 201 },
  { method: 'get', path: '/api/boards/{id}/votes', summary: "The board's votes, newest first (members)", tag: 'votes' },
  { method: 'get', path: '/api/votes/{id}', summary: 'A vote with its Bradley–Terry ranking (members)', tag: 'votes' },
  { method: 'get', path: '/api/votes/{id}/next-pair', summary: 'The next pair to answer, the least compared first; 204 when you have answered every pair or the vote has closed', tag: 'votes' },
  { method: 'put', path: '/api/votes/{id}/answers', summary: 'Answer a pair (one answer per member per pair, changeable until it closes; 409 when closed)', tag: 'votes', body: c.voteAnswerBody },
  { method: 'post', path: '/api/votes/{id}/close', summary: 'Close a vote now (editor)', tag: 'votes' },
];
