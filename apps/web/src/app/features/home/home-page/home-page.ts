import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../../core/auth/auth-store';
import { ConfigStore } from '../../../core/config/config-store';
import { barleycorn, lineStudyPaths, SketchSpec, sketchHeight } from './line-study-sketch';
// The page opens on the showcase, then the new and top-rated rows.
import { EntryRow } from '../../showcase/entry-row/entry-row';
import { ShowcaseSection } from '../../showcase/showcase-section/showcase-section';
import { ShowcaseStore } from '../../showcase/showcase-store';

const SKETCH: SketchSpec = { width: 480, lines: 13, spacing: 13, amplitude: 11, period: 44, phase: barleycorn };

/** One thing a signed-in member can do next. */
interface NextStep {
  icon: string;
  title: string;
  text: string;
  link: string;
  action: string;
  testId: string;
}

@Component({
  selector: 'bw-home-page',
  imports: [NgTemplateOutlet, RouterLink, MatButtonModule, MatIconModule, EntryRow, ShowcaseSection],
  providers: [ShowcaseStore],
  templateUrl: './home-page.html',
  styleUrl: './home-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HomePage {
  protected readonly auth = inject(AuthStore);
  private readonly config = inject(ConfigStore);
  protected readonly bars = inject(ShowcaseStore);
  protected readonly units = computed(() => this.auth.me()?.units ?? 'mm');
  protected readonly canCurate = computed(() => this.auth.hasRole(['moderator', 'admin']));

  protected readonly sketchPaths = lineStudyPaths(SKETCH);
  protected readonly sketchViewBox = `0 0 ${SKETCH.width} ${sketchHeight(SKETCH)}`;

  constructor() {
    this.bars.load();
  }

  protected readonly nextSteps = computed<NextStep[]>(() => {
    const me = this.auth.me();
    if (!me) return [];
    const steps: NextStep[] = [];
    if (!me.emailVerified) {
      steps.push({ icon: 'mark_email_unread', title: 'Confirm your e-mail', text: `Open the link we sent to ${me.email}, or ask for a new one.`, link: '/account/profile', action: 'Open profile', testId: 'next-verify' });
    }
    steps.push({ icon: 'straighten', title: 'Choose your units', text: `Lengths show in ${me.units === 'in' ? 'inches' : 'millimetres'}. Change it if your shop works in the other.`, link: '/account/profile', action: 'Set units', testId: 'next-units' });
    if (me.role === 'admin') {
      steps.push({ icon: 'group', title: 'Look after the people', text: 'Grant or remove the moderator role, and suspend an account if you must.', link: '/admin/people', action: 'Open People', testId: 'next-people' });
    }
    if (this.config.config().localMail) {
      steps.push({ icon: 'mail', title: 'Read the local mailbox', text: 'This server keeps its mail on this machine. Verification and reset mails land there.', link: '/mailbox', action: 'Open Mailbox', testId: 'next-mailbox' });
    }
    return steps;
  });
}
