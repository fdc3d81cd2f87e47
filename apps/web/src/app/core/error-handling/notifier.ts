import { inject, Injectable } from '@angular/core';
import { MatSnackBar } from '@angular/material/snack-bar';
import { firstValueFrom, map, merge } from 'rxjs';

/** Short messages the user must see, in a snack bar that screen readers announce. */
@Injectable({ providedIn: 'root' })
export class Notifier {
  private readonly snackBar = inject(MatSnackBar);

  /** Shows `message`; resolves true when the user chose `action`. */
  tell(message: string, action?: string, durationMs = 6000): Promise<boolean> {
    const ref = this.snackBar.open(message, action ?? 'Dismiss', { duration: durationMs, politeness: 'polite' });
    const chosen = ref.onAction().pipe(map(() => action !== undefined));
    const closed = ref.afterDismissed().pipe(map((d) => d.dismissedByAction && action !== undefined));
    return firstValueFrom(merge(chosen, closed));
  }
}
