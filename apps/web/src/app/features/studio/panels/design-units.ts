import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonToggleChange, MatButtonToggleModule } from '@angular/material/button-toggle';
import type { Units } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { CollabSession } from '../collab/collab-session';
import { valueAt } from '../fields/design-values';
import { FieldPresence } from '../fields/field-presence/field-presence';
import { convertDesignUnits } from '../units/field-units';

/**
 * The design file's own units. Every length shows in them; switching converts every length of the
 * file exactly (inch = 25.4 mm) for everyone on the design. Your profile's preference is a reminder.
 */
@Component({
  selector: 'bw-design-units',
  imports: [MatButtonToggleModule, FieldPresence],
  template: `
    <bw-field-presence field="units">
      <div class="units" role="group" aria-labelledby="units-label">
        <span id="units-label" class="label">Design units</span>
        <mat-button-toggle-group [value]="units()" (change)="switchTo($event)" [disabled]="session.readOnly() || !session.parsed().ok"
                                 hideSingleSelectionIndicator aria-labelledby="units-label" data-testid="design-units">
          <mat-button-toggle value="mm" data-testid="design-units-mm">mm</mat-button-toggle>
          <mat-button-toggle value="in" data-testid="design-units-in">in</mat-button-toggle>
        </mat-button-toggle-group>
      </div>
    </bw-field-presence>
    <p class="bw-muted note">
      Lengths are shown and stored in the design’s units; switching converts every length exactly.
      @if (preferred() && preferred() !== units()) { Your profile prefers {{ preferred() === 'in' ? 'inches' : 'millimetres' }}. }
      @if (!session.parsed().ok) { Fix the fields marked in red before switching. }
    </p>
  `,
  styles: `
    .units {
      display: flex;
      align-items: center;
      gap: 1rem;
      padding: 0.25rem 0;
    }
    .label {
      font: var(--mat-sys-title-small);
    }
    mat-button-toggle-group {
      --mat-button-toggle-height: 36px;
    }
    .note {
      margin: 0.25rem 0 0;
      font: var(--mat-sys-body-small);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignUnits {
  protected readonly session = inject(CollabSession);
  private readonly auth = inject(AuthStore);
  protected readonly preferred = computed(() => this.auth.me()?.units ?? null);
  protected readonly units = computed<Units>(() => (valueAt(this.session.design(), 'units') === 'in' ? 'in' : 'mm'));

  protected switchTo(change: MatButtonToggleChange): void {
    const parsed = this.session.parsed();
    if (!parsed.ok || (change.value !== 'mm' && change.value !== 'in')) return;
    this.session.replaceDesign(convertDesignUnits(parsed.design, change.value));
  }
}
