import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule } from '@angular/material/dialog';
import type { Units } from '@barwright/contracts';
import type { CompareSide } from './compare-side';
import { SideBySide } from './side-by-side';

export interface CompareDialogData {
  title: string;
  sides: readonly CompareSide[];
  units?: Units;
}

/** The side-by-side comparison in a wide dialog (from the studio's history, the design page and Explore). */
@Component({
  selector: 'bw-compare-dialog',
  imports: [MatButtonModule, MatDialogModule, SideBySide],
  template: `
    <h2 mat-dialog-title>{{ data.title }}</h2>
    <mat-dialog-content class="content" data-testid="compare-dialog">
      <bw-side-by-side [sides]="data.sides" [units]="data.units ?? null" />
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close data-testid="compare-close">Close</button>
    </mat-dialog-actions>
  `,
  styles: `
    .content {
      max-height: min(80vh, 60rem);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CompareDialog {
  protected readonly data = inject<CompareDialogData>(MAT_DIALOG_DATA);
}

/** Opens the comparison; resolves when it is closed. */
export async function openCompare(dialog: MatDialog, data: CompareDialogData): Promise<void> {
  const ref = dialog.open(CompareDialog, { data, width: '72rem', maxWidth: '96vw', autoFocus: 'first-heading', ariaLabel: data.title });
  await new Promise<void>((resolve) => ref.afterClosed().subscribe(() => resolve()));
}
