import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { EntryChanges } from '@barwright/contracts';
import { openCompare } from '../../../shared/compare/compare-dialog';
import { EntriesApi } from '../entries-api';
import { EntryStore } from '../entry-store';

/** What a remix changed against the revision it came from, field by field in the trade's words and units. */
@Component({
  selector: 'bw-entry-changes',
  imports: [RouterLink, MatButtonModule, MatIconModule],
  template: `
    <section class="block" aria-labelledby="changes-title" data-testid="entry-changes">
      <div class="title-row">
        <h2 id="changes-title">What changed</h2>
        @if (changes().parent?.title) {
          <button mat-stroked-button type="button" (click)="compareWithParent()" [disabled]="opening()" data-testid="entry-compare-parent">
            <mat-icon aria-hidden="true">compare</mat-icon>
            Side by side with its parent
          </button>
        }
      </div>
      @if (changes().parent; as parent) {
        <p class="bw-muted lede">
          Revision {{ changes().revision }} against
          @if (parent.title) {
            <a [routerLink]="['/entries', parent.entryId]">{{ parent.title }}</a>
          } @else {
            its parent (no longer shown)
          }, revision {{ parent.revision }}.
        </p>
        @if (changes().changes.length === 0) {
          <p>Nothing: the same design file as its parent.</p>
        } @else {
          <table>
            <thead><tr><th scope="col">Field</th><th scope="col">Parent</th><th scope="col">This remix</th></tr></thead>
            <tbody>
              @for (c of changes().changes; track c.path) {
                <tr data-testid="entry-change" [attr.data-path]="c.path">
                  <th scope="row">{{ c.label }}</th>
                  <td>{{ c.before ?? 'none' }}</td>
                  <td class="after">{{ c.after ?? 'none' }}</td>
                </tr>
              }
            </tbody>
          </table>
        }
      }
    </section>
  `,
  styles: `
    :host {
      display: block;
    }
    h2 {
      font: var(--mat-sys-title-large);
      margin: 0;
    }
    .title-row {
      display: flex;
      flex-wrap: wrap;
      align-items: center;
      justify-content: space-between;
      gap: 0.5rem 1rem;
      margin-bottom: 0.75rem;
    }
    .lede {
      margin: 0 0 0.75rem;
    }
    table {
      width: 100%;
      border-collapse: collapse;
      font: var(--mat-sys-body-medium);
    }
    th,
    td {
      padding: 0.5rem 0.75rem 0.5rem 0;
      text-align: left;
      vertical-align: top;
      border-bottom: 1px solid var(--bw-rule);
      overflow-wrap: anywhere;
    }
    thead th {
      font: var(--mat-sys-label-large);
      color: var(--mat-sys-on-surface-variant);
    }
    tbody th {
      font: var(--mat-sys-title-small);
    }
    .after {
      color: var(--bw-brass-ink);
      font-weight: 500;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EntryChangesView {
  private readonly api = inject(EntriesApi);
  private readonly store = inject(EntryStore);
  private readonly dialog = inject(MatDialog);
  readonly changes = input.required<EntryChanges>();
  protected readonly opening = signal(false);

  /** The parent's revision and this remix's latest, drawn side by side with their fields. */
  protected async compareWithParent(): Promise<void> {
    const parent = this.changes().parent;
    const entry = this.store.entry();
    if (!parent || !entry) return;
    this.opening.set(true);
    let before;
    try {
      before = await this.api.revision(parent.entryId, parent.revision);
    } finally {
      this.opening.set(false);
    }
    await openCompare(this.dialog, {
      title: `“${entry.title}” against its parent`,
      sides: [
        { label: parent.title ?? 'Parent', note: `the parent, revision ${parent.revision}, by ${before.author.displayName}`, link: ['/entries', parent.entryId], design: before.design },
        { label: entry.title, note: `this remix, revision ${entry.latest.number}`, design: entry.latest.design },
      ],
    });
  }
}
