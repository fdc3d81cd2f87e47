import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { RouterLink } from '@angular/router';
import type { EntryChanges } from '@barwright/contracts';

/** What a remix changed against the revision it came from, field by field in the trade's words and units. */
@Component({
  selector: 'bw-entry-changes',
  imports: [RouterLink],
  template: `
    <section class="block" aria-labelledby="changes-title" data-testid="entry-changes">
      <h2 id="changes-title">What changed</h2>
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
  readonly changes = input.required<EntryChanges>();
}
