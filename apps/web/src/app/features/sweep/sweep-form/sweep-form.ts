import { ChangeDetectionStrategy, Component, computed, input, model } from '@angular/core';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import type { PhaseSchedule, Rack, SweepChoices } from '@barwright/contracts';
import { roundLength } from '@barwright/engine/length-format';
import { rackTags } from '../../rack/rack-tags';
import { shopInUnits } from '../../rack/shop-units';
import { cutterWords, followerWords, rubberWords, travelWords } from '../candidate-words';
import { entryNumber, optionsOf, sameItem, SWEEP_SCHEDULES, toggled } from '../sweep-choices';

type ListName = 'rubbers' | 'travels' | 'cutters';
type StudyLength = 'lineSpacing' | 'depth';

/** The choices of a sweep: rosettes (all, by tag, picked) × rubbers × travel settings × cutters, the follower, bar and line study, in the sweep's units. */
@Component({
  selector: 'bw-sweep-form',
  imports: [MatCheckboxModule, MatChipsModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatSelectModule],
  templateUrl: './sweep-form.html',
  styleUrl: './sweep-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SweepForm {
  readonly rack = input.required<Rack>();
  readonly choices = model.required<SweepChoices>();
  readonly disabled = input(false);

  protected readonly units = computed(() => this.choices().units);
  private readonly shop = computed(() => shopInUnits(this.rack().shop, this.units()));
  protected readonly tags = computed(() => rackTags(this.rack().rosettes));
  protected readonly lists = computed(() => {
    const c = this.choices();
    const shop = this.shop();
    const u = this.units();
    const rows = <T>(name: ListName, options: T[], words: (item: T) => string) =>
      options.map((item) => ({ name, item, label: words(item), on: (c[name] as unknown[]).some((x) => sameItem(x, item)) }));
    return [
      { name: 'rubbers' as const, legend: 'Rubbers', testId: 'sweep-rubber', rows: rows('rubbers', optionsOf(shop.rubbers, c.rubbers), (r) => rubberWords(r, u)) },
      { name: 'travels' as const, legend: 'Travel settings', testId: 'sweep-travel', rows: rows('travels', optionsOf(shop.travels, c.travels), (t) => travelWords(t, u)) },
      { name: 'cutters' as const, legend: 'End mills', testId: 'sweep-cutter', rows: rows('cutters', optionsOf(shop.cutters, c.cutters), (m) => cutterWords(m, u)) },
    ];
  });
  protected readonly followers = computed(() => {
    const c = this.choices();
    return optionsOf(this.shop().followers, [c.follower]).map((f) => ({ item: f, label: followerWords(f, this.units()) }));
  });
  protected readonly followerIndex = computed(() => this.followers().findIndex((f) => sameItem(f.item, this.choices().follower)));
  protected readonly pickedIds = computed(() => {
    const r = this.choices().rosettes;
    return r.by === 'picked' ? r.ids : [];
  });
  protected readonly chosenTags = computed(() => {
    const r = this.choices().rosettes;
    return r.by === 'tags' ? r.tags : [];
  });
  protected readonly schedules = computed(() =>
    SWEEP_SCHEDULES.map((s) => ({ ...s, on: this.choices().study.schedules.some((x) => sameItem(x, s.schedule)) })),
  );

  protected chooseBy(by: 'all' | 'tags' | 'picked'): void {
    const rack = this.rack();
    const rosettes = by === 'all' ? { by } : by === 'tags' ? { by, tags: this.tags().slice(0, 1) } : { by, ids: rack.rosettes.slice(0, 1).map((r) => r.id) };
    this.choices.update((c) => ({ ...c, rosettes }) as SweepChoices);
  }

  protected pick(ids: string[]): void {
    this.choices.update((c) => ({ ...c, rosettes: { by: 'picked', ids } }));
  }

  protected chooseTags(tags: string[]): void {
    this.choices.update((c) => ({ ...c, rosettes: { by: 'tags', tags } }));
  }

  protected toggle(name: ListName, item: unknown, on: boolean): void {
    const options = this.lists().find((l) => l.name === name)!.rows.map((r) => r.item);
    this.choices.update((c) => ({ ...c, [name]: toggled(options, c[name] as unknown[], item, on) }));
  }

  protected chooseFollower(index: number): void {
    const f = this.followers()[index];
    if (f) this.choices.update((c) => ({ ...c, follower: f.item }));
  }

  protected toggleSchedule(schedule: PhaseSchedule, on: boolean): void {
    this.choices.update((c) => {
      const chosen = SWEEP_SCHEDULES.map((s) => s.schedule).filter((s) => (sameItem(s, schedule) ? on : c.study.schedules.some((x) => sameItem(x, s))));
      return { ...c, study: { ...c.study, schedules: chosen } };
    });
  }

  /** A length as an entry box shows it (the formatter's entry rounding). */
  protected entry(value: number): number {
    return roundLength(value, this.units(), true);
  }

  protected setBarLength(text: string): void {
    const v = entryNumber(text);
    if (v !== null) this.choices.update((c) => ({ ...c, barLength: v }));
  }

  protected setStudyLength(field: StudyLength, text: string): void {
    const v = entryNumber(text);
    if (v !== null) this.choices.update((c) => ({ ...c, study: { ...c.study, [field]: v } }));
  }

  protected setLines(text: string): void {
    const v = entryNumber(text);
    if (v !== null) this.choices.update((c) => ({ ...c, study: { ...c.study, lines: Math.round(v) } }));
  }
}
