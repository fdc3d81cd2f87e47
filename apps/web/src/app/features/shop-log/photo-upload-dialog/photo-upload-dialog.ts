import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, inject, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialog, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatRadioModule } from '@angular/material/radio';
import { latestCalendarDate, PHOTO_CAPTION_MAX, PHOTO_MATERIAL_MAX, PHOTO_TYPES, photoFields, type Photo, type PhotoKind } from '@barwright/contracts';
import { firstValueFrom, type Subscription } from 'rxjs';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { ShopLogApi, type PhotoTarget } from '../shop-log-api';
import { fileProblem, uploadRefusal, uploadStep } from '../upload-progress';
import { localDate } from './local-date';

/** Adds a photo of a real cut to the shop log: the image, trial cut or keeper, caption, material and the day of the cut. */
@Component({
  selector: 'bw-photo-upload-dialog',
  imports: [DecimalPipe, ReactiveFormsModule, MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatRadioModule],
  templateUrl: './photo-upload-dialog.html',
  styleUrl: './photo-upload-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoUploadDialog {
  private readonly target = inject<PhotoTarget>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<PhotoUploadDialog, Photo>>(MatDialogRef);
  private readonly api = inject(ShopLogApi);
  private readonly destroyRef = inject(DestroyRef);
  protected readonly form = inject(NonNullableFormBuilder).group({
    kind: ['trial' as PhotoKind],
    caption: ['', contractValidator(photoFields.shape.caption)],
    material: ['', contractValidator(photoFields.shape.material)],
    date: [localDate(new Date()), [Validators.required, contractValidator(photoFields.shape.date)]],
  });
  protected readonly file = signal<File | null>(null);
  protected readonly fileError = signal<string | null>(null);
  /** Null while idle; a fraction (or null inside for "size unknown") while sending. */
  protected readonly progress = signal<{ fraction: number | null } | null>(null);
  protected readonly problem = signal<string | null>(null);
  protected readonly accept = PHOTO_TYPES.join(',');
  protected readonly maxDate = latestCalendarDate();
  protected readonly captionMax = PHOTO_CAPTION_MAX;
  protected readonly materialMax = PHOTO_MATERIAL_MAX;
  protected readonly fieldMessage = fieldMessage;
  private sending: Subscription | null = null;

  protected choose(event: Event): void {
    const file = (event.target as HTMLInputElement).files?.[0] ?? null;
    this.file.set(file);
    this.problem.set(null);
    this.fileError.set(file ? fileProblem(file) : null);
  }

  protected submit(): void {
    this.problem.set(null);
    const file = this.file();
    if (!file) this.fileError.set('Choose a photo to upload.');
    if (this.form.invalid || !file || this.fileError()) {
      this.form.markAllAsTouched();
      return;
    }
    this.progress.set({ fraction: 0 });
    this.sending = this.api
      .upload(this.target, file, this.form.getRawValue())
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (event) => {
          const step = uploadStep(event);
          if (step?.kind === 'sending') this.progress.set({ fraction: step.fraction });
          if (step?.kind === 'done') this.ref.close(step.body);
        },
        error: (error: unknown) => {
          this.progress.set(null);
          this.problem.set(uploadRefusal(error));
        },
      });
  }

  protected cancel(): void {
    this.sending?.unsubscribe(); // aborts the request
    this.ref.close();
  }
}

/** Opens the upload dialog; resolves with the stored photo, or undefined when cancelled. */
export async function openPhotoUpload(dialog: MatDialog, target: PhotoTarget): Promise<Photo | undefined> {
  const ref = dialog.open<PhotoUploadDialog, PhotoTarget, Photo>(PhotoUploadDialog, { data: target, width: '32rem', maxWidth: 'calc(100vw - 2rem)', disableClose: true });
  return firstValueFrom(ref.afterClosed());
}
