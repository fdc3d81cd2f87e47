import { Location } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, inject, input, signal, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import {
  candidateDesign, candidateTitle, chosenRosettes, DESIGNS_BATCH_MAX, sweepCandidates, sweepChoicesSchema, sweepCountProblem, sweepCountText,
  type CandidateKey, type Rack, type SweepCandidate, type SweepChoices, type SweepSummary,
} from '@barwright/contracts';
import { ApiError } from '../../../core/http/api-error';
import { Notifier } from '../../../core/error-handling/notifier';
import { RackApi } from '../../rack/rack-api';
import { SweepRunner } from '../run/sweep-runner';
import type { SweepItem, SweepLight, SweepStudy } from '../run/sweep-types';
import { SweepApi } from '../sweep-api';
import { defaultChoices, keysOfStars, starOf, starsOfKeys } from '../sweep-choices';
import { NO_FILTER, shownIndices, type SweepFilter, type SweepSort } from '../sweep-filters';
import { SweepForm } from '../sweep-form/sweep-form';
import { SweepGrid } from '../sweep-grid/sweep-grid';
import { SweepResultsBar } from '../sweep-results-bar/sweep-results-bar';
import { SweepShortlist } from '../sweep-shortlist/sweep-shortlist';

type Entry = { key: CandidateKey; candidate: SweepCandidate };

/** Where the thumbnails' light comes from (degrees): upper left, as a bench lamp stands. */
const LIGHT: SweepLight = { azimuth: 135, elevation: 35 };

/**
 * The sweep: choose from the rack and the shop, see the count, run it in the pool of workers with
 * results streaming into the grid, filter, sort and group them, compare a few, star the best and send
 * them to a board; save the choices and the stars and reopen them (results are recomputed).
 */
/** Least time between two refreshes of the grid while a sweep runs (ms). */
const BUMP_MS = 250;

@Component({
  selector: 'bw-sweep-page',
  imports: [MatButtonModule, MatIconModule, RouterLink, SweepForm, SweepGrid, SweepResultsBar, SweepShortlist],
  providers: [SweepRunner],
  templateUrl: './sweep-page.html',
  styleUrl: './sweep-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepPage {
  private readonly rackApi = inject(RackApi);
  private readonly api = inject(SweepApi);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly location = inject(Location);
  protected readonly runner = inject(SweepRunner);

  /** The saved sweep's id from the route (/rack/sweep/:id), if any. */
  readonly id = input<string | undefined>(undefined);

  protected readonly rack = signal<Rack | null>(null);
  protected readonly choices = signal<SweepChoices | null>(null);
  protected readonly savedId = signal<string | null>(null);
  protected readonly name = signal('');
  protected readonly saved = signal<SweepSummary[]>([]);
  protected readonly saving = signal(false);
  protected readonly problem = signal<string | null>(null);

  /** The last run: its candidates, their results as they come (filled in place), and a counter bumped as they do. */
  protected readonly entries = signal<Entry[]>([]);
  private readonly ran = signal<SweepChoices | null>(null);
  protected items: (SweepItem | undefined)[] = [];
  protected readonly version = signal(0);
  private bumpQueued = false;
  private lastBump = 0;

  protected readonly stars = signal<ReadonlySet<string>>(new Set());
  protected readonly picked = signal<number[]>([]);
  protected readonly filter = signal<SweepFilter>(NO_FILTER);
  protected readonly sort = signal<SweepSort>('order');
  protected readonly grouped = signal(false);
  protected readonly scheduleIndex = signal(0);
  protected readonly light = LIGHT;

  protected readonly rosetteCount = computed(() => {
    const c = this.choices();
    const rack = this.rack();
    return c && rack ? chosenRosettes(c, rack.rosettes).length : 0;
  });
  protected readonly countText = computed(() => {
    const c = this.choices();
    return c ? sweepCountText(c, this.rosetteCount()) : '';
  });
  /** Why Run is refused: too many bars (the contract's message), nothing chosen, or a field out of bounds. */
  protected readonly refusal = computed(() => {
    const c = this.choices();
    if (!c) return null;
    const over = sweepCountProblem(c, this.rosetteCount());
    if (over) return over;
    if (this.rosetteCount() === 0) return 'No rosette is chosen: pick one or more, or choose another tag.';
    const checked = sweepChoicesSchema.safeParse(c);
    if (!checked.success) {
      const issue = checked.error.issues[0];
      return `${choiceLabel(issue.path)} ${issue.message}.`;
    }
    return null;
  });
  protected readonly running = computed(() => this.runner.progress().state === 'running');

  private readonly lookup = computed(() => {
    this.version();
    const entries = this.entries();
    const tags = new Map((this.rack()?.rosettes ?? []).map((r) => [r.id, r.tags]));
    return {
      count: entries.length,
      tags: (i: number) => tags.get(entries[i].key.rosetteId) ?? [],
      figures: (i: number) => {
        const item = this.items[i];
        return item === undefined ? undefined : item.ok ? item.figures : null;
      },
    };
  });
  protected readonly shown = computed(() => shownIndices(this.lookup(), this.filter(), this.sort()));
  protected readonly starredIndices = computed(() => {
    const stars = this.stars();
    const set = new Set<number>();
    this.entries().forEach((e, i) => {
      if (stars.has(starOf(e.key.rosetteId, e.candidate))) set.add(i);
    });
    return set;
  });
  protected readonly shortlist = computed(() => [...this.starredIndices()].map((i) => ({ index: i, title: candidateTitle(this.entries()[i].candidate) })));
  protected readonly runTags = computed(() => {
    const ids = new Set(this.entries().map((e) => e.key.rosetteId));
    return [...new Set((this.rack()?.rosettes ?? []).filter((r) => ids.has(r.id)).flatMap((r) => r.tags))].sort((a, b) => a.localeCompare(b));
  });
  protected readonly schedules = computed(() => this.ran()?.study.schedules ?? []);
  /** The thumbnails' study in mm, drawn with the chosen schedule. */
  protected readonly study = computed<SweepStudy>(() => {
    const c = this.ran() ?? this.choices();
    if (!c) return { lineSpacing: 0.45, lines: 40, schedule: { kind: 'alternate' }, vAngle: 120, depth: 0.1 };
    const k = c.units === 'in' ? 25.4 : 1;
    const schedule = c.study.schedules[Math.min(this.scheduleIndex(), c.study.schedules.length - 1)];
    return { lineSpacing: c.study.lineSpacing * k, lines: c.study.lines, schedule, vAngle: c.study.vAngle, depth: c.study.depth * k };
  });
  protected readonly showCutter = computed(() => (this.ran()?.cutters.length ?? 0) > 1);
  protected readonly units = computed(() => this.choices()?.units ?? this.rack()?.units ?? 'mm');

  constructor() {
    void this.load();
    inject(DestroyRef).onDestroy(() => this.runner.cancel());
    // Choices changed after a run: the compare picks refer to the old grid only while it is shown; nothing else to do.
    effect(() => {
      this.entries();
      untracked(() => this.picked.set([]));
    });
  }

  private async load(): Promise<void> {
    const [rack, saved] = await Promise.all([this.rackApi.read(), this.api.list()]);
    this.rack.set(rack);
    this.saved.set(saved);
    const id = this.id();
    if (!id) {
      this.choices.set(defaultChoices(rack));
      return;
    }
    try {
      const sweep = await this.api.read(id);
      this.savedId.set(sweep.id);
      this.name.set(sweep.name);
      this.choices.set(sweep.choices);
      this.stars.set(new Set(starsOfKeys(sweep.shortlist, sweep.choices)));
      this.run();
    } catch (error) {
      if (!(error instanceof ApiError) || error.status !== 404) throw error;
      this.problem.set('This saved sweep is not among yours; start a new one below.');
      this.choices.set(defaultChoices(rack));
    }
  }

  protected run(): void {
    const c = this.choices();
    const rack = this.rack();
    if (!c || !rack || this.refusal()) return;
    const entries = sweepCandidates(c, rack.rosettes);
    this.items = new Array(entries.length);
    this.ran.set(c);
    this.scheduleIndex.set(0);
    this.entries.set(entries);
    this.version.update((v) => v + 1);
    this.runner.run(entries.map((e, index) => ({ index, candidate: e.candidate })), (index, item) => {
      this.items[index] = item;
      this.queueBump();
    });
  }

  protected cancel(): void {
    this.runner.cancel();
  }

  /**
   * Results arrive many a frame. The grid and the filters are told at most every BUMP_MS (the first
   * results at once, the last when the run ends): filtering, sorting and laying out thousands of cards
   * every frame kept the page's thread busy a whole core, which the workers needed (5 000 took 18 s).
   */
  private queueBump(): void {
    if (this.bumpQueued) return;
    this.bumpQueued = true;
    const finished = this.runner.progress().state !== 'running' || this.items.length === 0;
    const wait = finished ? 0 : Math.max(0, this.lastBump + BUMP_MS - performance.now());
    setTimeout(() => requestAnimationFrame(() => {
      this.bumpQueued = false;
      this.lastBump = performance.now();
      this.version.update((v) => v + 1);
    }), wait);
  }

  protected setStar(index: number, on: boolean): void {
    const e = this.entries()[index];
    if (!e) return;
    const star = starOf(e.key.rosetteId, e.candidate);
    this.stars.update((s) => {
      const next = new Set(s);
      if (on) next.add(star);
      else next.delete(star);
      return next;
    });
  }

  protected setPick(index: number, on: boolean): void {
    this.picked.update((p) => (on ? (p.includes(index) || p.length >= 4 ? p : [...p, index]) : p.filter((i) => i !== index)));
  }

  protected async compare(): Promise<void> {
    const entries = this.entries();
    const sides = this.picked().map((i) => ({ label: candidateTitle(entries[i].candidate), design: candidateDesign(entries[i].candidate) }));
    if (sides.length < 2) return;
    const { openCompare } = await import('../../../shared/compare/compare-dialog');
    await openCompare(this.dialog, { title: `${sides.length} candidates side by side`, sides, units: this.units() });
  }

  protected async opposite(index: number): Promise<void> {
    const candidate = this.entries()[index]?.candidate;
    if (!candidate) return;
    const { OppositeDialog } = await import('../opposite-dialog/opposite-dialog');
    this.dialog.open(OppositeDialog, { data: { title: candidateTitle(candidate), candidate }, width: '64rem', maxWidth: '96vw', autoFocus: 'dialog' });
  }

  protected async sendToBoard(): Promise<void> {
    const entries = this.entries();
    const designs = [...this.starredIndices()].map((i) => ({
      title: candidateTitle(entries[i].candidate),
      file: candidateDesign(entries[i].candidate),
      rackRosetteId: entries[i].key.rosetteId,
    }));
    if (designs.length === 0) return;
    if (designs.length > DESIGNS_BATCH_MAX) {
      void this.notifier.tell(`A board takes at most ${DESIGNS_BATCH_MAX} designs at once; unstar some first.`, undefined, 5000);
      return;
    }
    const { ShortlistDialog } = await import('../shortlist-dialog/shortlist-dialog');
    this.dialog.open(ShortlistDialog, { data: { designs }, width: '34rem', maxWidth: '96vw' });
  }

  /** Saves the choices and the stars (as keys into these choices); a new sweep gets its own address. */
  protected async save(): Promise<void> {
    const c = this.choices();
    const rack = this.rack();
    const name = this.name().trim();
    if (!c || !rack) return;
    if (!name) {
      this.problem.set('Give the sweep a name to save it.');
      return;
    }
    this.problem.set(null);
    this.saving.set(true);
    try {
      const shortlist = keysOfStars(this.stars(), sweepCandidates(c, rack.rosettes));
      const sweep = await this.api.save(this.savedId(), { name, choices: c, shortlist });
      this.savedId.set(sweep.id);
      this.location.replaceState(`/rack/sweep/${sweep.id}`);
      this.saved.set(await this.api.list());
      void this.notifier.tell(`“${sweep.name}” is saved with ${shortlist.length} starred.`, undefined, 3000);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.problem.set(fields.length ? fields.map(([path, message]) => `${choiceLabel(path.split('.'))} ${message}.`).join(' ') : error.message);
    } finally {
      this.saving.set(false);
    }
  }

  protected secondsLeft(ms: number): string {
    const s = Math.max(1, Math.round(ms / 1000));
    return s < 60 ? `${s} s` : `${Math.floor(s / 60)} min ${String(s % 60).padStart(2, '0')} s`;
  }

  protected setName(value: string): void {
    this.name.set(value);
  }
}

const CHOICE_WORDS: Readonly<Record<string, string>> = {
  name: 'The name',
  choices: 'The sweep',
  rosettes: 'Rosettes',
  rubbers: 'Rubbers',
  travels: 'Travel settings',
  cutters: 'End mills',
  follower: 'The follower',
  barLength: 'Bar length',
  lineSpacing: 'Line spacing',
  lines: 'Lines',
  schedules: 'Phase schedules',
  depth: 'V-groove depth',
  shortlist: 'The shortlist',
};

/** A choice's path in words: the last named part that has words ("study.lineSpacing" → "Line spacing"). */
function choiceLabel(path: readonly PropertyKey[]): string {
  for (let i = path.length - 1; i >= 0; i--) {
    const words = CHOICE_WORDS[String(path[i])];
    if (words) return words;
  }
  return 'The choices';
}
