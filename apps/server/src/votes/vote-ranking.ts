import { fitBradleyTerry } from '@barwright/engine';
import type { RankedDesign, VotePick } from '@barwright/contracts';

export interface StoredAnswer {
  lowId: string;
  highId: string;
  /** Said of the stored order: `a` the low id won, `b` the high id. */
  pick: VotePick;
}

/** A pair in stored order (the lower id first, as PostgreSQL orders uuids) with the pick turned to match. */
export function storedPair(a: string, b: string, pick: VotePick): StoredAnswer {
  const [x, y] = [a.toLowerCase(), b.toLowerCase()];
  if (x < y) return { lowId: x, highId: y, pick };
  return { lowId: y, highId: x, pick: pick === 'a' ? 'b' : pick === 'b' ? 'a' : 'tie' };
}

/** Every unordered pair of the designs, in stored order. */
export function allPairs(designIds: readonly string[]): [string, string][] {
  const pairs: [string, string][] = [];
  for (let i = 0; i < designIds.length; i++) {
    for (let j = i + 1; j < designIds.length; j++) {
      const { lowId, highId } = storedPair(designIds[i], designIds[j], 'tie');
      pairs.push([lowId, highId]);
    }
  }
  return pairs;
}

/** The Bradley–Terry ranking of the designs from every member's answers (ties half a win each), strongest first. */
export function rankDesigns(designIds: readonly string[], answers: readonly StoredAnswer[]): RankedDesign[] {
  const index = new Map(designIds.map((id, i) => [id.toLowerCase(), i]));
  const results = answers.flatMap((a) => {
    const i = index.get(a.lowId);
    const j = index.get(a.highId);
    return i === undefined || j === undefined ? [] : [{ i, j, scoreI: a.pick === 'a' ? 1 : a.pick === 'b' ? 0 : 0.5 }];
  });
  const fit = fitBradleyTerry(designIds.length, results);
  return designIds
    .map((designId, i) => ({ designId, strength: fit.strengths[i], wins: fit.wins[i], comparisons: fit.comparisons[i] }))
    .sort((p, q) => q.strength - p.strength || q.wins - p.wins || p.designId.localeCompare(q.designId));
}
