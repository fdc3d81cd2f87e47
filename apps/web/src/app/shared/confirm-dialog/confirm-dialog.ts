import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule } from '@angular/material/dialog';
import { firstValueFrom } from 'rxjs';

/** What the confirm dialog asks. `danger` colours the confirming button as a warning. */
export interface ConfirmRequest {
  title: string;
  message: string;
  confirmLabel: string;
  cancelLabel?: string;
  danger?: boolean;
}

@Component({
  selector: 'bw-confirm-dialog',
  imports: [MatButtonModule, MatDialogModule],
  template: `
    <h2 mat-dialog-title>{{ request.title }}</h2>
    <mat-dialog-content>
      <p>{{ request.message }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" [mat-dialog-close]="false" data-testid="confirm-cancel">{{ request.cancelLabel ?? 'Cancel' }}</button>
      <button mat-flat-button type="button" [class.danger]="request.danger" [mat-dialog-close]="true"
              data-testid="confirm-accept">{{ request.confirmLabel }}</button>
    </mat-dialog-actions>
  `,
  styles: `
    .danger {
      --mat-button-filled-container-color: var(--mat-sys-error);
      --mat-button-filled-label-text-color: var(--mat-sys-on-error);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmDialog {
  protected readonly request = inject<ConfirmRequest>(MAT_DIALOG_DATA);
}

/** Opens the confirm dialog; resolves true only when the user confirmed. */
export async function confirmWith(dialog: MatDialog, request: ConfirmRequest): Promise<boolean> {
  const ref = dialog.open<ConfirmDialog, ConfirmRequest, boolean>(ConfirmDialog, { data: request, maxWidth: '28rem', autoFocus: 'first-tabbable' });
  return (await firstValueFrom(ref.afterClosed())) === true;
}
