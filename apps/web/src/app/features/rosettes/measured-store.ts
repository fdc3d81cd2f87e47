import { computed, inject, Injectable, signal } from '@angular/core';
import { MEASURED_MIN_POINTS, type MeasuredPreview } from '@barwright/contracts';
import { RosettesApi } from './rosettes-api';

/** The measured-rosette page: the server's reading of the table, newest request winning. */
@Injectable()
export class MeasuredStore {
  private readonly api = inject(RosettesApi);
  private readonly current = signal<MeasuredPreview | null>(null);
  private readonly inFlight = signal(false);
  private asked = 0;

  readonly preview = this.current.asReadonly();
  readonly loading = this.inFlight.asReadonly();
  readonly points = computed(() => this.current()?.points ?? []);
  readonly rowErrors = computed(() => (this.current()?.errors ?? []).filter((e) => e.line !== null));
  readonly tableErrors = computed(() => (this.current()?.errors ?? []).filter((e) => e.line === null));
  /** Usable as a measured wave: enough good readings and nothing wrong with the table as a whole. */
  readonly usable = computed(() => this.points().length >= MEASURED_MIN_POINTS && this.tableErrors().length === 0);

  async read(table: string): Promise<void> {
    const ticket = ++this.asked;
    if (!table.trim()) {
      this.current.set(null);
      return;
    }
    this.inFlight.set(true);
    try {
      const preview = await this.api.preview(table);
      if (ticket === this.asked) this.current.set(preview);
    } finally {
      if (ticket === this.asked) this.inFlight.set(false);
    }
  }
}
