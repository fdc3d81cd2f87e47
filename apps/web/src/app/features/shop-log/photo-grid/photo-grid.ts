import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal, untracked } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import type { Photo } from '@barwright/contracts';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { openPhotoUpload } from '../photo-upload-dialog/photo-upload-dialog';
import { ShopLogApi, type PhotoTarget } from '../shop-log-api';
import { ReportButton } from '../../moderation/report-dialog/report-button';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

/** The shop log: photos of real cuts (trial cuts and keepers) as a grid, with the upload for members. */
@Component({
  selector: 'bw-photo-grid',
  imports: [DateTextPipe, RouterLink, MatButtonModule, MatIconModule, ReportButton],
  templateUrl: './photo-grid.html',
  styleUrl: './photo-grid.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoGrid {
  private readonly api = inject(ShopLogApi);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  protected readonly auth = inject(AuthStore);

  readonly target = input.required<PhotoTarget>();
  /** Whether this viewer may add photos here (signed in, and the entry open). */
  readonly canUpload = input(false);
  readonly returnUrl = input('/');
  readonly countChanged = output<number>();
  protected readonly photos = signal<Photo[] | null>(null);

  constructor() {
    effect(() => {
      const target = this.target();
      untracked(() => void this.load(target));
    });
  }

  protected async upload(): Promise<void> {
    const photo = await openPhotoUpload(this.dialog, this.target());
    if (!photo) return;
    void this.notifier.tell('The photo is in the shop log. Its metadata was removed.', undefined, 4000);
    await this.load(this.target());
  }

  protected async remove(photo: Photo): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: 'Delete this photo?',
      message: 'It leaves the shop log for everyone, and its file is removed from the server.',
      confirmLabel: 'Delete photo',
      danger: true,
    });
    if (!confirmed) return;
    await this.api.remove(photo.id);
    await this.load(this.target());
  }

  private async load(target: PhotoTarget): Promise<void> {
    const photos = await this.api.list(target);
    this.photos.set(photos);
    this.countChanged.emit(photos.length);
  }
}
