import { DestroyRef, Injector, runInInjectionContext } from '@angular/core';
import { EXAMPLE_DESIGN, type Design } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import type { ComputeReply } from './compute-messages';
import { DesignCompute } from './design-compute';
import { computeDesignViews, studyLeadOf, type StudyLead } from './design-views';

/*
 * The worker's replies as the page receives them, in the orders they can come: for each stage its
 * study first (`lead`) and the rest of its views straight after, or an error in place of either. No
 * request is sent (jsdom has no Worker); the replies are handed to the service as its worker's would be.
 */
const SHORT_BAR: Design = { ...EXAMPLE_DESIGN, bar: { ...EXAMPLE_DESIGN.bar, length: 30 } };

function service(): { compute: DesignCompute; receive: (reply: ComputeReply) => void } {
  const injector = Injector.create({ providers: [{ provide: DestroyRef, useValue: { onDestroy: () => () => {} } }] });
  const compute = runInInjectionContext(injector, () => new DesignCompute());
  const receive = (reply: ComputeReply) => (compute as unknown as { receive(r: ComputeReply): void }).receive(reply);
  return { compute, receive };
}

/** A stage's two replies, as the worker sends them. */
function replies(id: number, design: Design, stage: 'preview' | 'full'): [ComputeReply, ComputeReply] {
  const { study, ...views } = computeDesignViews(design, stage);
  return [{ id, lead: studyLeadOf({ stage, study, profile: views.profile }) }, { id, views }];
}

describe('the studio compute service receiving its worker’s replies', () => {
  it('shows a stage’s views with the study its lead sent ahead', () => {
    const { compute, receive } = service();
    const [lead, rest] = replies(1, SHORT_BAR, 'full');
    receive(lead);
    expect(compute.study()).toBe((lead as { lead: StudyLead }).lead);
    expect(compute.views()).toBeNull();
    receive(rest);
    expect(compute.views()?.study).toBe((lead as { lead: StudyLead }).lead.study);
    expect(compute.full()).toBe(compute.views());
  });

  it('goes back to the shown views’ study when a stage sends its study and then fails', () => {
    const { compute, receive } = service();
    replies(1, SHORT_BAR, 'full').forEach(receive);
    const shownStudy = compute.views()!.study;
    const [lead] = replies(2, { ...SHORT_BAR, bar: { ...SHORT_BAR.bar, length: 40 } }, 'full');
    receive(lead);
    expect(compute.study()?.study).not.toBe(shownStudy);
    receive({ id: 2, error: 'The bar could not be drawn.' });
    // The plates never keep a study whose bar and cut plan do not exist.
    expect(compute.study()?.study).toBe(shownStudy);
    expect(compute.views()?.study).toBe(shownStudy);
  });

  it('drops the rest of an older stage once a newer study has come', () => {
    const { compute, receive } = service();
    const [oldLead, oldRest] = replies(1, SHORT_BAR, 'full');
    const [newLead] = replies(2, SHORT_BAR, 'preview');
    receive(oldLead);
    receive(newLead);
    receive(oldRest);
    expect(compute.views()).toBeNull();
    expect(compute.study()).toBe((newLead as { lead: StudyLead }).lead);
  });

  it('makes a preview’s study final when the full computation after it fails, so the lit plate draws it', () => {
    const { compute, receive } = service();
    const longer = { ...SHORT_BAR, bar: { ...SHORT_BAR.bar, length: 40 } };
    replies(1, longer, 'preview').forEach(receive);
    expect(compute.studyIsDraft()).toBe(true);
    const previewStudy = compute.views()!.study;
    const [fullLead] = replies(1, longer, 'full');
    receive(fullLead);
    expect(compute.studyIsDraft()).toBe(false);
    receive({ id: 1, error: 'The cut plan could not be made.' });
    expect(compute.study()?.study).toBe(previewStudy);
    expect(compute.studyIsDraft()).toBe(false);
  });

  it('does the same when the full computation fails before its study', () => {
    const { compute, receive } = service();
    replies(1, SHORT_BAR, 'preview').forEach(receive);
    receive({ id: 1, error: 'The bar could not be computed.' });
    expect(compute.study()?.study).toBe(compute.views()!.study);
    expect(compute.studyIsDraft()).toBe(false);
  });

  it('leaves the study alone for an error of an older request', () => {
    const { compute, receive } = service();
    replies(2, SHORT_BAR, 'full').forEach(receive);
    const study = compute.study();
    receive({ id: 1, error: 'stale' });
    expect(compute.study()).toBe(study);
    expect(compute.views()?.study).toBe(study?.study);
  });

  it('holds a study back while no plate is on the screen, and shows it with the rest of its views', () => {
    const { compute, receive } = service();
    replies(1, SHORT_BAR, 'full').forEach(receive);
    compute.setStudyInView(false);
    const before = compute.study();
    const [lead, rest] = replies(2, { ...SHORT_BAR, bar: { ...SHORT_BAR.bar, length: 40 } }, 'full');
    receive(lead);
    expect(compute.study()).toBe(before); // one redraw for the edit, not one for the study's captions and one for the bar
    receive(rest);
    expect(compute.study()).toBe((lead as { lead: StudyLead }).lead);
    expect(compute.views()?.study).toBe((lead as { lead: StudyLead }).lead.study);
  });

  it('shows a held study as soon as a plate comes on the screen', () => {
    const { compute, receive } = service();
    compute.setStudyInView(false);
    const [lead] = replies(1, SHORT_BAR, 'full');
    receive(lead);
    expect(compute.study()).toBeNull();
    compute.setStudyInView(true);
    expect(compute.study()).toBe((lead as { lead: StudyLead }).lead);
  });

  it('drops a held study whose stage fails, keeping the shown one', () => {
    const { compute, receive } = service();
    replies(1, SHORT_BAR, 'full').forEach(receive);
    const shown = compute.study();
    compute.setStudyInView(false);
    const [lead] = replies(2, { ...SHORT_BAR, bar: { ...SHORT_BAR.bar, length: 40 } }, 'full');
    receive(lead);
    receive({ id: 2, error: 'The bar could not be drawn.' });
    compute.setStudyInView(true);
    expect(compute.study()?.study).toBe(shown?.study);
  });
});
