import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { CollabSession } from '../collab/collab-session';
import { valueAt } from '../fields/design-values';
import { NumberField } from '../fields/number-field/number-field';

/** The terms of a Fourier-series wave: w(t) ∝ Σ aₖ cos kt + bₖ sin kt, scaled to ±1. */
@Component({
  selector: 'bw-fourier-terms',
  imports: [MatButtonModule, MatIconModule, NumberField],
  template: `
    <div class="fields" role="group" [attr.aria-label]="'Fourier terms of layer ' + (layer() + 1)">
      <p class="bw-muted note">Harmonic k with cosine and sine coefficients; the sum is scaled to the layer’s amplitude.</p>
      @for (term of terms(); track $index; let j = $index) {
        <div class="row">
          <bw-number-field [path]="base() + '[' + j + '].k'" [slider]="false" />
          <bw-number-field [path]="base() + '[' + j + '].a'" label="Cosine" [slider]="false" />
          <bw-number-field [path]="base() + '[' + j + '].b'" label="Sine" [slider]="false" />
          <button mat-icon-button type="button" class="remove" (click)="remove(j)" [disabled]="session.readOnly() || terms().length <= 1"
                  [attr.aria-label]="'Remove term ' + (j + 1)">
            <mat-icon aria-hidden="true">remove_circle_outline</mat-icon>
          </button>
        </div>
      }
      @if (error()) { <p class="problem" role="alert">Fourier terms {{ error() }}</p> }
      <div class="actions">
        <button mat-button type="button" (click)="add()" [disabled]="session.readOnly() || terms().length >= 32">
          <mat-icon aria-hidden="true">add</mat-icon>
          Add a term
        </button>
      </div>
    </div>
  `,
  styleUrl: './panels.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FourierTerms {
  protected readonly session = inject(CollabSession);
  readonly layer = input.required<number>();

  protected readonly base = computed(() => `rosette.layers[${this.layer()}].wave.terms`);
  protected readonly terms = computed(() => {
    const terms = valueAt(this.session.design(), this.base());
    return Array.isArray(terms) ? terms : [];
  });
  protected readonly error = computed(() => this.session.fieldErrors().get(this.base()) ?? '');

  protected add(): void {
    const highest = Math.max(0, ...this.terms().map((t) => Number((t as { k?: unknown })?.k) || 0));
    this.session.addItem(['rosette', 'layers', this.layer(), 'wave', 'terms'], { k: Math.min(64, highest + 1), a: 0, b: 0.1 });
  }

  protected remove(index: number): void {
    this.session.removeItem(['rosette', 'layers', this.layer(), 'wave', 'terms'], index);
  }
}
