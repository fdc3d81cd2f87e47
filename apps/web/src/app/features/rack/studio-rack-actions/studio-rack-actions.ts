import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { RACK_LIMITS, type DesignParseResult } from '@barwright/contracts';
import { Notifier } from '../../../core/error-handling/notifier';
import { askForName } from '../../../shared/name-dialog/name-dialog';
import { RackApi } from '../rack-api';

/** A rack rosette's name as the server checks it: required, at most RACK_LIMITS.nameMax characters. */
const ROSETTE_NAME = {
  safeParse(value: unknown) {
    const name = typeof value === 'string' ? value.trim() : '';
    const message = !name ? 'is required' : name.length > RACK_LIMITS.nameMax ? `must be at most ${RACK_LIMITS.nameMax} characters` : null;
    return message ? { success: false as const, error: { issues: [{ message }] } } : { success: true as const };
  },
};

/** In the studio, under the rosette: keep this design's rosette in the rack, or bring in a measured one. */
@Component({
  selector: 'bw-studio-rack-actions',
  imports: [MatButtonModule, MatIconModule, RouterLink],
  template: `
    <div class="rack-actions">
      <button mat-button type="button" (click)="save()" [disabled]="!design()" data-testid="studio-save-rosette">
        <mat-icon aria-hidden="true">bookmark_add</mat-icon> Save this rosette to my rack
      </button>
      <a mat-button routerLink="/rack/measured" [queryParams]="boardId() ? { board: boardId() } : {}" data-testid="studio-measured-link">
        <mat-icon aria-hidden="true">straighten</mat-icon> Import a measured rosette
      </a>
    </div>
  `,
  styles: `.rack-actions { display: flex; flex-wrap: wrap; gap: 0.25rem; margin-top: 0.5rem; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StudioRackActions {
  private readonly api = inject(RackApi);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  /** The design as it checks out now. */
  readonly parsed = input<DesignParseResult>();
  /** None while a field has a problem: only a rosette the design file accepts goes to the rack. */
  protected readonly design = computed(() => {
    const parsed = this.parsed();
    return parsed?.ok ? parsed.design : undefined;
  });
  readonly title = input<string | undefined>();
  readonly boardId = input<string | undefined>();

  protected async save(): Promise<void> {
    const design = this.design();
    if (!design) return;
    const saved = await askForName(this.dialog, {
      title: 'Save the rosette to your rack',
      label: 'Rosette name',
      initial: (this.title() ?? 'Rosette').slice(0, RACK_LIMITS.nameMax),
      hint: 'Its base radius and layers are kept; the rest of the design stays here.',
      maxLength: RACK_LIMITS.nameMax,
      schema: ROSETTE_NAME,
      confirmLabel: 'Save to rack',
      testId: 'save-rosette',
      save: async (name) => {
        await this.api.addRosette({ name, units: design.units, rosette: design.rosette, tags: [], notes: '' });
      },
    });
    if (saved) void this.notifier.tell('The rosette is in your rack.', 'Open the rack', 5000);
  }
}
