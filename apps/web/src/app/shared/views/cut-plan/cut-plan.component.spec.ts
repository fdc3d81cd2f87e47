import { TestBed } from '@angular/core/testing';
import { EXAMPLE_DESIGN, MATERIAL_NAMES, type Design } from '@barwright/contracts';
import { computeProfile, formatLength, planCut, SAFETY_CAUTIONS, type CutPlan as Plan } from '@barwright/engine';
import { beforeAll, describe, expect, it } from 'vitest';
import { CutPlan } from './cut-plan';

/** The example design's plan, and one whose step-over is deeper than A2 takes in a pass (the engine warns). */
let plan: Plan;
let deepPlan: Plan;
beforeAll(() => {
  plan = planCut(EXAMPLE_DESIGN, computeProfile(EXAMPLE_DESIGN));
  const deep: Design = { ...EXAMPLE_DESIGN, plan: { ...EXAMPLE_DESIGN.plan, stepOver: 0.5 } };
  deepPlan = planCut(deep, computeProfile(deep));
});

async function render(inputs: Record<string, unknown>): Promise<HTMLElement> {
  const fixture = TestBed.createComponent(CutPlan);
  for (const [name, value] of Object.entries({ units: 'mm', ...inputs })) fixture.componentRef.setInput(name, value);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

function figures(el: HTMLElement): Map<string, string> {
  const rows = el.querySelectorAll('[data-testid="plan-figures"] .figure');
  return new Map([...rows].map((r) => [r.querySelector('dt')!.textContent!.trim(), r.querySelector('dd')!.textContent!.trim()]));
}

/** The items of a list as read (a warning's icon is decoration: its words are in the span). */
function listed(el: HTMLElement, testId: string): string[] {
  return [...el.querySelectorAll(`[data-testid="${testId}"] li`)].map((li) => (li.querySelector('span') ?? li).textContent!.trim());
}

describe('CutPlan', () => {
  it('shows the safety cautions even before there is a plan', async () => {
    const el = await render({ plan: null, emptyNote: 'Fix the fields to see the plan.' });
    expect(el.textContent).toContain('Fix the fields to see the plan.');
    expect(el.querySelector('[data-testid="plan-figures"]')).toBeNull();
    expect(listed(el, 'plan-cautions')).toEqual([...SAFETY_CAUTIONS]);
    expect(el.querySelector('[data-testid="plan-supplier-note"]')!.textContent).toContain('starting points, not instructions');
  });

  it('shows the passes, the time and the material of the engine’s plan', async () => {
    const el = await render({ plan });
    const f = figures(el);
    expect(f.get('Passes')).toBe(`${plan.passes} at ${formatLength(EXAMPLE_DESIGN.plan.stepOver, 'mm')}`);
    expect(plan.passes).toBeGreaterThan(1);
    expect(f.get('Total cutting time')).toBe(`${Math.round(plan.totalMinutes)} min`); // the example takes over a minute, under an hour
    expect(f.get('Depth into the edge')).toBe(formatLength(plan.depth, 'mm'));
    expect(f.get('Spindle speed')).toMatch(/^[\d,]+ rpm$/);
    expect(el.querySelector('.material')!.textContent).toBe(MATERIAL_NAMES.a2);
    expect(listed(el, 'plan-reminders').length).toBe(plan.reminders.length);
    expect(listed(el, 'plan-cautions')).toEqual(plan.cautions);
    expect(el.querySelector('[data-testid="plan-warnings"]')).toBeNull(); // the example's plan has none
  });

  it('writes the plan in inches for an inch design', async () => {
    const el = await render({ plan, units: 'in' });
    const f = figures(el);
    expect(f.get('Passes')).toBe(`${plan.passes} at ${formatLength(EXAMPLE_DESIGN.plan.stepOver, 'in')}`);
    expect(f.get('Depth into the edge')).toMatch(/ in$/);
    expect(f.get('Feed for the chip load')).toMatch(/ in\/min$/);
  });

  it('lists the engine’s warnings with the cautions still shown', async () => {
    expect(deepPlan.warnings.map((w) => w.code)).toContain('pass-too-deep');
    const el = await render({ plan: deepPlan });
    expect(listed(el, 'plan-warnings')).toEqual(deepPlan.warnings.map((w) => w.message));
    expect(listed(el, 'plan-cautions').length).toBeGreaterThan(0);
  });

  it('says it is working while a plan is being worked out', async () => {
    const el = await render({ plan, working: true });
    expect(el.querySelector('mat-progress-bar')?.getAttribute('aria-label')).toBe('Working out the cut plan');
  });
});
