import { describe, expect, it } from 'vitest';
import { candidateDesign, parseDesign, rackShopBody, rosetteIssues } from '@barwright/contracts';
import { DEMO_ACCOUNTS } from './demo-scenario';
import { DEMO_RACKS } from './demo-racks';

describe('the demo racks', () => {
  it('give every invented member a rack whose rosettes and shop the rack’s own checks accept', () => {
    expect(DEMO_RACKS.map((r) => r.email).sort()).toEqual(DEMO_ACCOUNTS.map((a) => a.email).sort());
    for (const rack of DEMO_RACKS) {
      const account = DEMO_ACCOUNTS.find((a) => a.email === rack.email)!;
      expect(rack.units, rack.email).toBe(account.units);
      for (const r of rack.rosettes) expect(rosetteIssues(r.rosette, rack.units), `${rack.email} ${r.name}`).toEqual([]);
      expect(rackShopBody(rack.units).safeParse(rack.shop).success, rack.email).toBe(true);
      expect(new Set(rack.rosettes.map((r) => r.name)).size).toBe(rack.rosettes.length);
    }
  });

  it('give one member about thirty rosettes of varied waves, a few of them measured', () => {
    const maren = DEMO_RACKS.find((r) => r.email === 'maren@example.test')!;
    expect(maren.rosettes.length).toBeGreaterThanOrEqual(28);
    const shapes = new Set(maren.rosettes.flatMap((r) => r.rosette.layers.map((l) => l.wave.shape)));
    expect([...shapes].sort()).toEqual(['eccentric', 'flat', 'fourier', 'measured', 'pointed', 'scallop', 'sine']);
    expect(maren.rosettes.filter((r) => r.tags.includes('measured')).length).toBeGreaterThanOrEqual(3);
  });

  it('make a valid bar design of every rosette × rubber × travel × cutter of each shop', () => {
    for (const rack of DEMO_RACKS) {
      const { rubbers, travels, cutters, followers, vCutters } = rack.shop;
      for (const r of rack.rosettes) for (const rubber of rubbers) for (const travel of travels) for (const cutter of cutters) {
        const design = candidateDesign({
          units: rack.units,
          rosette: { name: r.name, units: rack.units, rosette: r.rosette },
          ...{ rubber, travel, cutter, follower: followers[0], barLength: rack.units === 'in' ? 6 : 150 },
          study: { lineSpacing: rack.units === 'in' ? 0.018 : 0.45, lines: 40, schedule: { kind: 'alternate' }, vAngle: vCutters[0].vAngle, depth: rack.units === 'in' ? 0.004 : 0.1 },
        });
        const result = parseDesign(design);
        expect(result.ok ? [] : result.errors, `${rack.email} ${r.name}`).toEqual([]);
      }
    }
  });
});
