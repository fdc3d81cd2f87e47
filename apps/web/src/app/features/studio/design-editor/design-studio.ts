import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, DestroyRef, effect, ElementRef, inject, input, OnInit, signal, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatDialog } from '@angular/material/dialog';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import { createDesignBody, DESIGN_TITLE_MAX } from '@barwright/contracts';
import { map } from 'rxjs';
import { AuthStore } from '../../../core/auth/auth-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { ApiError } from '../../../core/http/api-error';
import { KeepMotion } from '../../../shared/motion/keep-motion';
import { askForName } from '../../../shared/name-dialog/name-dialog';
import { openPublishDialog } from '../../../shared/publish-dialog/publish-dialog';
import { CollabSession } from '../collab/collab-session';
import { ConnectionAnnouncer } from '../collab/connection-announcer';
import { ConnectionChip } from '../collab/connection-chip';
import { NotesEditor } from '../collab/notes-editor';
import { DesignCompute } from '../compute/design-compute';
import { countUnder, problemLines } from '../fields/field-errors';
import { HistoryPanel } from '../history/history-panel';
import { CutPlanPanel } from '../panels/cut-plan-panel';
import { CutterBarPanel } from '../panels/cutter-bar-panel';
import { DesignUnits } from '../panels/design-units';
import { FollowerStudyPanel } from '../panels/follower-study-panel';
import { RosettePanel } from '../panels/rosette-panel';
import { RubberMotionPanel } from '../panels/rubber-motion-panel';
import { PresenceBar } from '../presence/presence-bar';
import { StudioStore } from '../studio-store';
import { LiveSummary } from './live-summary';
import { ExportButtons } from '../views/export-buttons/export-buttons';
import { StudioViews } from '../views/studio-views';
import { StudioRackActions } from '../../rack/studio-rack-actions/studio-rack-actions';

/** Below this width the parameters and the views share the screen by a switch. */
const NARROW_QUERY = '(max-width: 959.98px)';
/** Below this width the header scrolls away (a phone): a strip with the status and the plan stays in sight instead. */
const PHONE_QUERY = '(max-width: 599.98px)';

/** The parameter panels, grouped as the trade thinks, with the design paths each holds. */
export const PANELS = [
  { id: 'rosette', title: 'Rosette and its layers', prefixes: ['rosette'] },
  { id: 'rubber', title: 'Rubber and motion', prefixes: ['rubber', 'motion'] },
  { id: 'cutter', title: 'Cutter and bar', prefixes: ['cutter', 'bar.length', 'bar.thickness'] },
  { id: 'study', title: 'Follower and line study', prefixes: ['follower', 'study'] },
  { id: 'plan', title: 'Cut plan', prefixes: ['plan', 'bar.material'] },
] as const;

/**
 * The studio for one bar design. It provides the design's live session, its compute worker and its
 * store, so all three are made when a design is opened and go when it is left.
 */
@Component({
  selector: 'bw-design-studio',
  imports: [
    KeepMotion, RouterLink, MatButtonModule, MatButtonToggleModule, MatExpansionModule, MatIconModule, MatProgressBarModule, MatTooltipModule,
    ConnectionAnnouncer, ConnectionChip, PresenceBar, NotesEditor, HistoryPanel, DesignUnits, RosettePanel, RubberMotionPanel, CutterBarPanel,
    FollowerStudyPanel, CutPlanPanel, StudioViews, ExportButtons, LiveSummary, StudioRackActions,
  ],
  providers: [
    CollabSession, DesignCompute, StudioStore,
    // Material's own transitions off for what the studio holds: each edit redraws four views on the same
    // cores, and a field's label changing colour and place as the focus moved repainted and rastered the
    // page every frame meanwhile (about nine frames an edit; figures in apps/web/bench/studio-redraw-notes.md).
    // The fields change at once. Progress bars keep their motion (KeepMotion); dialogs, snack bars and
    // button ripples are made from the root and keep theirs.
    { provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } },
  ],
  templateUrl: './design-studio.html',
  styleUrl: './design-studio.scss',
  host: { '(document:keydown)': 'shortcut($event)' },
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DesignStudio implements OnInit {
  protected readonly session = inject(CollabSession);
  protected readonly compute = inject(DesignCompute);
  protected readonly store = inject(StudioStore);
  private readonly auth = inject(AuthStore);
  private readonly router = inject(Router);
  private readonly notifier = inject(Notifier);
  private readonly dialog = inject(MatDialog);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  readonly designId = input.required<string>();
  protected readonly panels = PANELS;
  private readonly breakpoints = inject(BreakpointObserver);
  protected readonly narrow = toSignal(this.breakpoints.observe(NARROW_QUERY).pipe(map((s) => s.matches)), { initialValue: false });
  protected readonly phone = toSignal(this.breakpoints.observe(PHONE_QUERY).pipe(map((s) => s.matches)), { initialValue: false });
  /** On a narrow screen: which half is shown. The views come first. */
  protected readonly pane = signal<'views' | 'parameters'>('views');
  protected readonly problems = computed(() => problemLines(this.session.fieldErrors()));
  protected readonly returnUrl = computed(() => `/studio/${this.designId()}`);

  constructor() {
    effect(() => this.session.setWritable(this.store.canEdit()));
    // The provider reconnects by itself; the role it now has comes from the server.
    effect(() => {
      if (this.session.roleChanges() > 0) untracked(() => void this.loadMeta());
    });
    this.compute.expectEdits();
    inject(DestroyRef).onDestroy(this.session.onValidDesign((design) => this.compute.request(design)));
  }

  ngOnInit(): void {
    const me = this.auth.me();
    if (me) this.session.open(this.designId(), { id: me.id, name: me.displayName });
    void this.loadMeta();
  }

  protected problemsIn(prefixes: readonly string[]): number {
    return countUnder(this.session.fieldErrors(), prefixes);
  }

  protected async rename(): Promise<void> {
    const meta = this.store.meta();
    if (!meta) return;
    await askForName(this.dialog, {
      title: 'Rename design',
      label: 'Title',
      initial: meta.title,
      maxLength: DESIGN_TITLE_MAX,
      schema: createDesignBody.shape.title,
      confirmLabel: 'Rename',
      testId: 'studio-rename',
      save: (title) => this.store.rename(title),
    });
  }

  /** Brings the full cut plan into view (on a narrow screen, with the views). */
  protected showPlan(): void {
    this.pane.set('views');
    requestAnimationFrame(() => this.host.nativeElement.querySelector('[data-testid="cut-plan"]')?.scrollIntoView({ behavior: 'smooth', block: 'start' }));
  }

  /** Publishes the design as it stands (a new entry, or a new revision of its entry), then opens the entry. */
  protected async publish(): Promise<void> {
    const meta = this.store.meta();
    if (!meta) return;
    const result = await openPublishDialog(this.dialog, { designId: meta.id, title: meta.title });
    if (result) await this.router.navigate(['/entries', result.entryId]);
  }

  /** Ctrl+Z undoes your own last edit, Ctrl+Shift+Z (or Ctrl+Y) redoes it; nobody else's edits are touched. */
  protected shortcut(event: KeyboardEvent): void {
    if (!(event.ctrlKey || event.metaKey) || event.altKey) return;
    const key = event.key.toLowerCase();
    if (key === 'z' && !event.shiftKey) {
      event.preventDefault();
      this.session.undo();
    } else if ((key === 'z' && event.shiftKey) || key === 'y') {
      event.preventDefault();
      this.session.redo();
    }
  }

  private async loadMeta(): Promise<void> {
    try {
      await this.store.load(this.designId());
    } catch (error) {
      if (error instanceof ApiError && error.status === 404) {
        void this.notifier.tell('That design does not exist, or you are not on its board.');
        await this.router.navigate(['/boards']);
        return;
      }
      throw error;
    }
  }
}
