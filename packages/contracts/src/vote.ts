import * as z from 'zod';
import { isoInstant } from './instant';

/**
 * "Which would you cut?": a vote over 3 to 30 designs of a board, answered in pairs by the board's
 * members, ranked by the Bradley–Terry model (ties count half a win to each).
 *   POST /api/boards/:id/votes        CreateVoteBody → 201 { id }   (owner or editor)
 *   GET  /api/boards/:id/votes        → VoteSummary[]               (members)
 *   GET  /api/votes/:id               → Vote                        (members)
 *   GET  /api/votes/:id/next-pair     → VotePair, or 204 when the member has answered every pair (or the vote has closed)
 *   PUT  /api/votes/:id/answers       VoteAnswerBody → Vote         (members; one answer per member per pair, changeable until closed)
 *   POST /api/votes/:id/close         → Vote                        (owner or editor)
 * Live: the socket.io namespace VOTES_NAMESPACE; a client emits `vote:watch` with a vote id (checked
 * on every message) and hears `vote:ranking` whenever an answer arrives or the vote closes.
 */
export const VOTE_LIMITS = { questionMax: 200, minDesigns: 3, maxDesigns: 30, maxDays: 90, openedPerBoardPerDay: 20 } as const;
export const VOTE_PICKS = ['a', 'b', 'tie'] as const;
export type VotePick = (typeof VOTE_PICKS)[number];

const designId = z.uuid('must be design ids');
/** A uuid may arrive in either letter case; two ids are the same design when they match ignoring it. */
const sameId = (x: string, y: string) => x.toLowerCase() === y.toLowerCase();

export const createVoteBody = z.strictObject({
  question: z.string({ error: 'is required' }).trim().min(1, 'is required').max(VOTE_LIMITS.questionMax, `must be at most ${VOTE_LIMITS.questionMax} characters`),
  designIds: z
    .array(designId, { error: 'must be a list of design ids' })
    .min(VOTE_LIMITS.minDesigns, `needs at least ${VOTE_LIMITS.minDesigns} designs`)
    .max(VOTE_LIMITS.maxDesigns, `takes at most ${VOTE_LIMITS.maxDesigns} designs`)
    .refine((ids) => new Set(ids.map((id) => id.toLowerCase())).size === ids.length, 'must not repeat a design'),
  /** When it closes by itself; in the future, within VOTE_LIMITS.maxDays. */
  closesAt: isoInstant(),
});
export type CreateVoteBody = z.infer<typeof createVoteBody>;

export const voteAnswerBody = z
  .strictObject({ a: designId, b: designId, pick: z.enum(VOTE_PICKS, { error: 'must be "a", "b" or "tie"' }) })
  .refine((p) => !sameId(p.a, p.b), { path: ['b'], message: 'must be another design than a' });
export type VoteAnswerBody = z.infer<typeof voteAnswerBody>;

export interface RankedDesign {
  designId: string;
  /** Bradley–Terry strength, normalised so the strengths sum to 1. */
  strength: number;
  /** Wins, ties counting half. */
  wins: number;
  comparisons: number;
}

export interface VoteSummary {
  id: string;
  boardId: string;
  question: string;
  closesAt: string;
  closed: boolean;
}

export interface Vote extends VoteSummary {
  designs: { id: string; title: string }[];
  createdBy: { id: string; displayName: string };
  createdAt: string;
  closedAt: string | null;
  answers: number;
  /** The caller's own answers, and how many pairs there are. */
  myAnswers: number;
  pairs: number;
  /** Strongest first. */
  ranking: RankedDesign[];
}

export interface VotePair {
  a: string;
  b: string;
}

export const VOTES_NAMESPACE = '/votes';
export const VOTE_REFUSALS = { unauthorized: 'unauthorized', notFound: 'not found' } as const;

export interface VoteServerEvents {
  /** The ranking after an answer or on watching; `closed` once it has closed. */
  'vote:ranking': (update: { voteId: string; ranking: RankedDesign[]; answers: number; closed: boolean }) => void;
  /** A watch refused: not a member of the vote's board (or no such vote). */
  'vote:refused': (update: { voteId: string; reason: string }) => void;
}

export interface VoteClientEvents {
  'vote:watch': (voteId: string) => void;
  'vote:unwatch': (voteId: string) => void;
}
