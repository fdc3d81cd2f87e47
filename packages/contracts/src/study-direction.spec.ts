import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, parseDesign } from './design';

describe('study.direction', () => {
  it('is optional, so files made before it stay valid (they mean the mirror)', () => {
    expect(parseDesign(EXAMPLE_DESIGN).ok).toBe(true);
  });

  it('takes "mirrored" or "as-bar"', () => {
    for (const direction of ['mirrored', 'as-bar']) expect(parseDesign({ ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, direction } }).ok).toBe(true);
  });

  it('refuses anything else, naming the field', () => {
    const parsed = parseDesign({ ...EXAMPLE_DESIGN, study: { ...EXAMPLE_DESIGN.study, direction: 'sideways' } });
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.errors).toContainEqual({ path: 'study.direction', message: 'must be "mirrored" or "as-bar"' });
  });
});
