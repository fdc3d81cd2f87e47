import { DOCUMENT } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, DestroyRef, inject, input, signal } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router } from '@angular/router';
import { createDesignBody, MEASURED_TABLE_MAX_BYTES, type BoardSummary, type Units } from '@barwright/contracts';
import { debounceTime } from 'rxjs';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { ApiError } from '../../../core/http/api-error';
import { editableBoards } from '../../../shared/board-choice/editable-boards';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { MeasuredStore } from '../measured-store';
import { polarPlot } from '../polar-plot';
import { readingsProblem } from '../readings-problem';
import { designFromReadings, measuredWaveJson } from '../readings-rosette';
import { RosettesApi } from '../rosettes-api';

const EXAMPLE = `angle,radius\n0,50.60\n30,49.40\n60,50.60\n90,49.40\n120,50.60\n150,49.40\n180,50.60\n210,49.40\n240,50.60\n270,49.40\n300,50.60\n330,49.40\n`;

/** Import a measured rosette: paste or load a table of readings, see it plotted with its bad rows named, take the points away. */
@Component({
  selector: 'bw-measured-page',
  imports: [ReactiveFormsModule, MatButtonModule, MatButtonToggleModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule],
  providers: [MeasuredStore],
  templateUrl: './measured-page.html',
  styleUrl: './measured-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MeasuredPage {
  protected readonly store = inject(MeasuredStore);
  private readonly api = inject(RosettesApi);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);
  private readonly document = inject(DOCUMENT);
  private readonly auth = inject(AuthStore);

  /** `?board=<id>` when opened from a board: the new design goes there. */
  readonly board = input<string>();
  protected readonly table = new FormControl('', { nonNullable: true });
  protected readonly units = signal<Units>(this.auth.me()?.units ?? 'mm');
  protected readonly fileProblem = signal<string | null>(null);
  protected readonly plot = computed(() => polarPlot(this.store.points()));
  protected readonly boards = signal<BoardSummary[] | null>(null);
  protected readonly boardChoice = new FormControl<string | null>(null, Validators.required);
  protected readonly title = new FormControl('Measured rosette', { nonNullable: true, validators: [Validators.required, contractValidator(createDesignBody.shape.title)] });
  protected readonly creating = signal(false);
  protected readonly createProblem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  protected readonly peakToValley = computed(() => {
    const p = this.plot();
    return Number((p.max - p.min).toFixed(6));
  });

  constructor() {
    this.table.valueChanges.pipe(debounceTime(500), takeUntilDestroyed(inject(DestroyRef))).subscribe((text) => void this.store.read(text));
    void this.api.boards().then((lists) => {
      const boards = editableBoards(lists);
      this.boards.set(boards);
      const wanted = boards.find((b) => b.id === this.board()) ?? boards[0];
      if (wanted) this.boardChoice.setValue(wanted.id);
    });
  }

  protected useExample(): void {
    this.table.setValue(EXAMPLE);
  }

  protected async load(event: Event): Promise<void> {
    const input = event.target as HTMLInputElement;
    const file = input.files?.[0];
    this.fileProblem.set(null);
    if (!file) return;
    if (file.size > MEASURED_TABLE_MAX_BYTES) {
      this.fileProblem.set(`The file is ${Math.ceil(file.size / 1024)} KB; a table may be at most ${MEASURED_TABLE_MAX_BYTES / 1024} KB.`);
      return;
    }
    this.table.setValue(await file.text());
    input.value = '';
  }

  protected downloadJson(): void {
    const blob = new Blob([measuredWaveJson(this.store.points())], { type: 'application/json' });
    const url = URL.createObjectURL(blob);
    const link = this.document.createElement('a');
    link.href = url;
    link.download = 'measured-rosette.json';
    link.click();
    setTimeout(() => URL.revokeObjectURL(url), 10_000);
  }

  protected async copyPoints(): Promise<void> {
    await this.document.defaultView?.navigator.clipboard.writeText(JSON.stringify(this.store.points()));
    void this.notifier.tell(`${this.store.points().length} readings copied as JSON.`, undefined, 3000);
  }

  /** A new design on the chosen board whose rosette is these readings; opens it in the studio. */
  protected async createDesign(): Promise<void> {
    this.createProblem.set(null);
    if (this.boardChoice.invalid || this.title.invalid) {
      this.boardChoice.markAsTouched();
      this.title.markAsTouched();
      return;
    }
    this.creating.set(true);
    try {
      const file = designFromReadings(this.store.points(), this.units());
      const { id } = await this.api.createDesign(this.boardChoice.value!, this.title.value.trim(), file);
      void this.notifier.tell('The design is made from your readings. Set the rubber, cutter and bar for your machine.', undefined, 5000);
      await this.router.navigate(['/studio', id]);
    } catch (error) {
      if (!(error instanceof ApiError) || error.retryable || error.status === 401) throw error;
      this.createProblem.set(this.refusal(error));
    } finally {
      this.creating.set(false);
    }
  }

  /** What to say about a refused design: a refused title goes on its field, the file's fields are named after the readings. */
  private refusal(error: ApiError): string | null {
    const fields = Object.entries(error.fields);
    if (fields.length === 0) return error.message;
    const said: string[] = [];
    for (const [path, message] of fields) {
      if (path === 'title') {
        this.title.setErrors({ server: message });
        this.title.markAsTouched();
      } else {
        said.push(readingsProblem(path, message, this.units()));
      }
    }
    return said.length > 0 ? said.map((line) => (/[.?!]$/.test(line) ? line : `${line}.`)).join(' ') : null;
  }
}
