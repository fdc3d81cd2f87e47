import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { RackShop, Units } from '@barwright/contracts';
import { formatLength, roundLength } from '@barwright/engine/length-format';
import { ApiError } from '../../../core/http/api-error';
import { Notifier } from '../../../core/error-handling/notifier';
import { RackApi } from '../rack-api';
import { rackFieldLabel } from '../rack-field-label';
import { shopInUnits, shopMm } from '../shop-units';

type ListKey = 'rubbers' | 'travels' | 'cutters' | 'followers' | 'vCutters';

/** One number of a shop item: a length (in the member's units) or a plain figure. */
interface FieldSpec {
  key: string;
  label: string;
  length: boolean;
  step: string;
}

interface ListSpec {
  key: ListKey;
  title: string;
  note: string;
  add: string;
  blank: () => Record<string, unknown>;
  fields: FieldSpec[];
}

/** What the shop holds besides rosettes; rubbers are edited apart (round or flat). */
const LISTS: ListSpec[] = [
  { key: 'travels', title: 'Travel settings', note: 'Bar travel for one turn of the rosette, and how far the cutter moves for each unit the rubber moves.', add: 'Add a travel setting', blank: () => ({ travelPerRev: 0, leverRatio: 1 }), fields: [
    { key: 'travelPerRev', label: 'Travel per revolution', length: true, step: 'any' },
    { key: 'leverRatio', label: 'Lever ratio', length: false, step: '0.05' },
  ] },
  { key: 'cutters', title: 'End mills', note: 'Ball or flat end mills for the bar.', add: 'Add an end mill', blank: () => ({ diameter: 0, flutes: 2 }), fields: [
    { key: 'diameter', label: 'Diameter', length: true, step: 'any' },
    { key: 'flutes', label: 'Flutes', length: false, step: '1' },
  ] },
  { key: 'followers', title: 'Followers', note: 'The straight-line machine\u2019s followers, by tip radius.', add: 'Add a follower', blank: () => ({ radius: 0 }), fields: [
    { key: 'radius', label: 'Tip radius', length: true, step: 'any' },
  ] },
  { key: 'vCutters', title: 'V-cutters', note: 'Included angle of the point.', add: 'Add a V-cutter', blank: () => ({ vAngle: 60 }), fields: [
    { key: 'vAngle', label: 'Angle (°)', length: false, step: '1' },
  ] },
];

/** The rest of the shop, every length in the member's units; saved as a whole. */
@Component({
  selector: 'bw-shop-editor',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './shop-editor.html',
  styleUrl: './shop-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShopEditor {
  private readonly api = inject(RackApi);
  private readonly notifier = inject(Notifier);

  readonly shop = input.required<RackShop>();
  readonly units = input.required<Units>();
  readonly saved = output<RackShop>();

  protected readonly lists = LISTS;
  /** The shop being edited, in the member's units. */
  protected readonly draft = signal<RackShop | null>(null);
  protected readonly dirty = signal(false);
  protected readonly saving = signal(false);
  protected readonly problems = signal<string[]>([]);

  constructor() {
    effect(() => {
      this.draft.set(structuredClone(shopInUnits(this.shop(), this.units())));
      this.dirty.set(false);
    });
  }

  protected items(key: ListKey): Record<string, unknown>[] {
    return (this.draft()?.[key] ?? []) as unknown as Record<string, unknown>[];
  }

  /** A length as the entry box shows it (0.0001 in / 0.0001 mm, so what was typed comes back). */
  protected entry(value: unknown): number | string {
    return typeof value === 'number' ? roundLength(value, this.units(), true) : '';
  }

  /** A length as a turner reads it (0.001 in / 0.01 mm; inches also as a stock fraction when one). */
  protected reading(value: unknown): string {
    return typeof value === 'number' && value > 0 ? formatLength(shopMm(value, this.units()), this.units(), { fraction: true }) : '';
  }

  protected set(key: ListKey, index: number, field: string, raw: string): void {
    this.change((shop) => {
      const item = (shop[key] as unknown as Record<string, unknown>[])[index];
      if (field === 'name') {
        if (raw.trim()) item['name'] = raw.trim();
        else delete item['name'];
      } else if (field === 'shape') {
        const size = (item['radius'] ?? item['width'] ?? 0) as number;
        delete item['radius'];
        delete item['width'];
        item['shape'] = raw;
        item[raw === 'round' ? 'radius' : 'width'] = size;
      } else {
        item[field] = raw.trim() === '' ? Number.NaN : Number(raw);
      }
    });
  }

  protected add(key: ListKey): void {
    const blank = key === 'rubbers' ? { shape: 'round', radius: 0 } : LISTS.find((l) => l.key === key)!.blank();
    this.change((shop) => (shop[key] as unknown as Record<string, unknown>[]).push(blank));
  }

  protected remove(key: ListKey, index: number): void {
    this.change((shop) => (shop[key] as unknown[]).splice(index, 1));
  }

  protected async save(): Promise<void> {
    const draft = this.draft();
    if (!draft) return;
    this.problems.set([]);
    this.saving.set(true);
    try {
      const { units, ...lists } = draft;
      void units;
      const saved = await this.api.saveShop({ ...lists, units: this.units() });
      this.saved.emit(saved);
      this.dirty.set(false);
      void this.notifier.tell('The shop is saved.', undefined, 3000);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.problems.set(fields.length ? fields.map(([path, message]) => `${rackFieldLabel(path)} ${message}.`) : [error.message]);
    } finally {
      this.saving.set(false);
    }
  }

  protected revert(): void {
    this.draft.set(structuredClone(shopInUnits(this.shop(), this.units())));
    this.dirty.set(false);
    this.problems.set([]);
  }

  private change(edit: (shop: RackShop) => void): void {
    const next = structuredClone(this.draft()!);
    edit(next);
    this.draft.set(next);
    this.dirty.set(true);
  }
}
