import { EventEmitter } from 'node:events';
import type { RankedDesign } from '@barwright/contracts';

/** Told whenever a vote's ranking changes (an answer, the close), so the vote socket can push it to the vote's room. */
export class VoteEvents extends EventEmitter<{
  ranking: [{ voteId: string; boardId: string; ranking: RankedDesign[]; answers: number; closed: boolean }];
}> {}
