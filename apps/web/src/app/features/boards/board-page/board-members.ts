import { ChangeDetectionStrategy, Component, inject, signal, viewChild } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectChange, MatSelectModule } from '@angular/material/select';
import { emailSchema, INVITE_ROLES, type BoardInvitation, type BoardMember } from '@barwright/contracts';
import { ConfigStore } from '../../../core/config/config-store';
import { Notifier } from '../../../core/error-handling/notifier';
import { confirmWith } from '../../../shared/confirm-dialog/confirm-dialog';
import { contractValidator } from '../../../shared/forms/contract-validator';
import { fieldMessage } from '../../../shared/forms/field-message';
import { formProblem } from '../../../shared/forms/form-problem';
import { injectInvalidFocus } from '../../../shared/forms/invalid-focus';
import { BoardStore } from '../board-store';
import { ROLE_HINTS, ROLE_LABELS } from '../board-roles';
import { DateTextPipe } from '../../../shared/dates/date-text-pipe';

type InviteRole = (typeof INVITE_ROLES)[number];

/** Members with their roles, and (for the owner) the invitations still open. */
@Component({
  selector: 'bw-board-members',
  imports: [DateTextPipe, ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule],
  templateUrl: './board-members.html',
  styleUrl: './board-members.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BoardMembers {
  protected readonly store = inject(BoardStore);
  protected readonly config = inject(ConfigStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  protected readonly inviteRoles = INVITE_ROLES;
  protected readonly roleLabel = ROLE_LABELS;
  protected readonly roleHint = ROLE_HINTS;
  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, contractValidator(emailSchema)]],
    role: ['editor' as InviteRole],
  });
  /** Resetting through the directive also clears "submitted", so the emptied field shows no error. */
  private readonly formDirective = viewChild(FormGroupDirective);
  protected readonly busy = signal(false);
  protected readonly problem = signal<string | null>(null);
  protected readonly fieldMessage = fieldMessage;
  private readonly focusInvalid = injectInvalidFocus();

  protected isMe(member: BoardMember): boolean {
    return member.userId === this.store.myUserId();
  }

  protected async invite(): Promise<void> {
    this.problem.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusInvalid();
      return;
    }
    this.busy.set(true);
    try {
      const { email, role } = this.form.getRawValue();
      await this.store.invite(email.trim(), role);
      this.formDirective()?.resetForm({ email: '', role });
      void this.notifier.tell(`Invitation sent to ${email.trim()}. The link works for 7 days.`, undefined, 4000);
    } catch (error) {
      this.problem.set(formProblem(error, this.form));
      this.focusInvalid();
    } finally {
      this.busy.set(false);
    }
  }

  protected async changeRole(member: BoardMember, change: MatSelectChange<InviteRole>): Promise<void> {
    try {
      await this.store.setMemberRole(member.userId, change.value);
      void this.notifier.tell(`${member.displayName} is now ${change.value === 'editor' ? 'an editor' : 'a viewer'}.`, undefined, 3000);
    } catch (error) {
      change.source.value = member.role; // the select already shows the refused choice; put it back
      throw error;
    }
  }

  protected async remove(member: BoardMember): Promise<void> {
    const confirmed = await confirmWith(this.dialog, {
      title: `Remove ${member.displayName}?`,
      message: `${member.email ?? member.displayName} loses access to this board and its designs at once, also in an editor they have open.`,
      confirmLabel: 'Remove member',
      danger: true,
    });
    if (!confirmed) return;
    await this.store.removeMember(member.userId);
    void this.notifier.tell(`${member.displayName} is no longer a member.`, undefined, 3000);
  }

  protected async revoke(invitation: BoardInvitation): Promise<void> {
    await this.store.revokeInvitation(invitation.id);
    void this.notifier.tell(`The invitation to ${invitation.email} is withdrawn.`, undefined, 3000);
  }
}
