import type { EngineWarning } from '@barwright/engine';
import { describe, expect, it } from 'vitest';
import { warningName, worstWarning } from './warning-names';

const w = (code: EngineWarning['code'], amount?: number): EngineWarning => ({ code, message: code, ...(amount === undefined ? {} : { amount }) });

describe('worstWarning', () => {
  it('names a cutting problem before any loss of detail', () => {
    expect(worstWarning([w('detail-lost-follower', 1.2), w('rubbing')])?.code).toBe('rubbing');
  });

  it('else the largest amount lost, and nothing for no warnings', () => {
    expect(worstWarning([w('valley-bridged', 0.05), w('detail-lost-follower', 0.31)])?.code).toBe('detail-lost-follower');
    expect(worstWarning([])).toBeNull();
  });

  it('gives each warning a short name for a table cell', () => {
    expect(warningName(w('detail-lost-follower'))).toBe('follower rounds crests');
  });
});
