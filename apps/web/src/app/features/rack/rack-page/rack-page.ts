import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { Router, RouterLink } from '@angular/router';
import { RACK_LIMITS, type Rack, type RackRosette, type RackShop } from '@barwright/contracts';
import { formatLength } from '@barwright/engine/length-format';
import { firstValueFrom } from 'rxjs';
import { ApiError } from '../../../core/http/api-error';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { RackApi } from '../rack-api';
import { rackFieldLabel } from '../rack-field-label';
import { rackTags } from '../rack-tags';
import { RosetteDialog, type RosetteDialogData } from '../rosette-dialog/rosette-dialog';
import { RosetteDrawing } from '../rosette-drawing';
import { ShopEditor } from '../shop-editor/shop-editor';
import { shopMm } from '../shop-units';

/** A member's rack: the rosettes they own (filter by tag), the rest of the shop, and the rack file in and out. */
@Component({
  selector: 'bw-rack-page',
  imports: [MatButtonModule, MatChipsModule, MatIconModule, MatMenuModule, RouterLink, RosetteDrawing, ShopEditor],
  templateUrl: './rack-page.html',
  styleUrl: './rack-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RackPage {
  private readonly api = inject(RackApi);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  protected readonly rack = signal<Rack | null>(null);
  protected readonly tag = signal<string | null>(null);
  protected readonly tags = computed(() => rackTags(this.rack()?.rosettes ?? []));
  protected readonly shown = computed(() => {
    const tag = this.tag();
    const rosettes = this.rack()?.rosettes ?? [];
    return tag ? rosettes.filter((r) => r.tags.includes(tag)) : rosettes;
  });
  protected readonly importProblems = signal<string[]>([]);
  protected readonly importing = signal(false);
  protected readonly limit = RACK_LIMITS.rosettes;

  constructor() {
    void this.reload();
  }

  /** Base radius and layers in a line, the radius in the member's units. */
  protected summary(r: RackRosette): string {
    const units = this.rack()?.units ?? 'mm';
    const layers = r.rosette.layers.map((l) => (l.wave.shape === 'measured' ? `measured (${l.wave.points.length} readings)` : `${l.lobes} × ${l.wave.shape}`));
    return `${formatLength(shopMm(r.rosette.baseRadius, r.units), units)} base · ${layers.join(' + ')}`;
  }

  protected async create(): Promise<void> {
    await this.edit(undefined);
  }

  protected async edit(rosette: RackRosette | undefined): Promise<void> {
    const data: RosetteDialogData = { rosette, units: this.rack()?.units ?? 'mm' };
    const ref = this.dialog.open<RosetteDialog, RosetteDialogData, RackRosette>(RosetteDialog, { data, width: '52rem', maxWidth: '96vw', autoFocus: 'first-tabbable' });
    const saved = await firstValueFrom(ref.afterClosed());
    if (saved) await this.reload();
  }

  protected async duplicate(r: RackRosette): Promise<void> {
    const name = `${r.name} (copy)`.slice(0, RACK_LIMITS.nameMax);
    await this.api.addRosette({ name, units: r.units, rosette: r.rosette, tags: r.tags, notes: r.notes });
    void this.notifier.tell(`“${name}” is in your rack.`, undefined, 3000);
    await this.reload();
  }

  protected async remove(r: RackRosette): Promise<void> {
    const ok = await confirmWith(this.dialog, { title: 'Delete this rosette?', message: `“${r.name}” leaves your rack. Designs already made from it keep their own copy.`, confirmLabel: 'Delete', danger: true });
    if (!ok) return;
    await this.api.removeRosette(r.id);
    await this.reload();
  }

  protected async newDesign(r: RackRosette): Promise<void> {
    // Loaded when asked for: the design file's unit conversion brings the engine's index, which the rack itself does not need.
    const { DesignFromRosetteDialog } = await import('../design-from-rosette/design-from-rosette-dialog');
    const ref = this.dialog.open<InstanceType<typeof DesignFromRosetteDialog>, RackRosette, string>(DesignFromRosetteDialog, { data: r, width: '28rem', maxWidth: '96vw' });
    const id = await firstValueFrom(ref.afterClosed());
    if (id) await this.router.navigate(['/studio', id]);
  }

  protected shopSaved(shop: RackShop): void {
    const rack = this.rack();
    if (rack) this.rack.set({ ...rack, shop });
  }

  /** Replaces the whole rack with a rack file; a refused file is listed field by field and nothing changes. */
  protected async importFile(event: Event): Promise<void> {
    const input = event.target as HTMLInputElement;
    const file = input.files?.[0];
    input.value = '';
    this.importProblems.set([]);
    if (!file) return;
    let body: unknown;
    try {
      body = JSON.parse(await file.text());
    } catch {
      this.importProblems.set([`${file.name} is not a JSON file; a rack file is the JSON that “Export the rack” downloads.`]);
      return;
    }
    const ok = await confirmWith(this.dialog, { title: 'Replace your rack?', message: `Everything in your rack is replaced by ${file.name}: its rosettes and its shop.`, confirmLabel: 'Replace' });
    if (!ok) return;
    this.importing.set(true);
    try {
      this.rack.set(await this.api.importFile(body));
      void this.notifier.tell(`Your rack is now ${file.name}.`, undefined, 4000);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      const fields = Object.entries(error.fields);
      this.importProblems.set(fields.length ? fields.map(([path, message]) => `${rackFieldLabel(path)} ${message}.`) : [error.message]);
    } finally {
      this.importing.set(false);
    }
  }

  protected chooseFile(input: HTMLInputElement): void {
    input.click();
  }

  private async reload(): Promise<void> {
    this.rack.set(await this.api.read());
    const tag = this.tag();
    if (tag && !this.tags().includes(tag)) this.tag.set(null);
  }
}
