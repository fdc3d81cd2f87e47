import { computed, inject, Injectable, signal } from '@angular/core';
import type { BoardDetail, DesignPreset } from '@barwright/contracts';
import { AuthStore } from '../../core/auth/auth-store';
import { BoardsApi } from './boards-api';

/** One board's page: its designs, members and open invitations. Every change asks the server, then reloads. */
@Injectable()
export class BoardStore {
  private readonly api = inject(BoardsApi);
  private readonly auth = inject(AuthStore);
  private readonly current = signal<BoardDetail | null>(null);
  private readonly busyKeys = signal<ReadonlySet<string>>(new Set());

  readonly board = this.current.asReadonly();
  /** Keys (`design:<id>`, `member:<id>`, `invitation:<id>`, `board`) of changes on their way to the server. */
  readonly pending = this.busyKeys.asReadonly();
  readonly isOwner = computed(() => this.current()?.role === 'owner');
  readonly canEdit = computed(() => {
    const role = this.current()?.role;
    return role === 'owner' || role === 'editor';
  });
  readonly liveDesigns = computed(() => (this.current()?.designs ?? []).filter((d) => !d.deletedAt));
  readonly deletedDesigns = computed(() => (this.current()?.designs ?? []).filter((d) => d.deletedAt));
  readonly myUserId = computed(() => this.auth.me()?.id ?? null);

  async load(id: string): Promise<void> {
    this.current.set(await this.api.get(id));
  }

  rename(name: string): Promise<void> {
    return this.run('board', async (id) => this.current.set(await this.api.update(id, { name })));
  }

  setArchived(archived: boolean): Promise<void> {
    return this.run('board', async (id) => this.current.set(await this.api.update(id, { archived })));
  }

  async createDesign(title: string, preset: DesignPreset): Promise<string> {
    const { id } = await this.api.createDesign(this.requireId(), title, preset);
    await this.reload();
    return id;
  }

  duplicate(designId: string): Promise<void> {
    return this.run(`design:${designId}`, async () => {
      await this.api.duplicateDesign(designId);
      await this.reload();
    });
  }

  renameDesign(designId: string, title: string): Promise<void> {
    return this.run(`design:${designId}`, async () => {
      await this.api.renameDesign(designId, title);
      await this.reload();
    });
  }

  deleteDesign(designId: string): Promise<void> {
    return this.run(`design:${designId}`, async () => {
      await this.api.deleteDesign(designId);
      await this.reload();
    });
  }

  restoreDesign(designId: string): Promise<void> {
    return this.run(`design:${designId}`, async () => {
      await this.api.restoreDesign(designId);
      await this.reload();
    });
  }

  async invite(email: string, role: 'editor' | 'viewer'): Promise<void> {
    await this.api.invite(this.requireId(), email, role);
    await this.reload();
  }

  revokeInvitation(invitationId: string): Promise<void> {
    return this.run(`invitation:${invitationId}`, async (id) => {
      await this.api.revokeInvitation(id, invitationId);
      await this.reload();
    });
  }

  setMemberRole(userId: string, role: 'editor' | 'viewer'): Promise<void> {
    return this.run(`member:${userId}`, async (id) => this.current.set(await this.api.setMemberRole(id, userId, role)));
  }

  removeMember(userId: string): Promise<void> {
    return this.run(`member:${userId}`, async (id) => {
      await this.api.removeMember(id, userId);
      await this.reload();
    });
  }

  /** Leaves the board; the page should go elsewhere afterwards (it is no longer visible). */
  async leave(): Promise<void> {
    const me = this.myUserId();
    if (me) await this.api.removeMember(this.requireId(), me);
  }

  private async reload(): Promise<void> {
    await this.load(this.requireId());
  }

  private requireId(): string {
    const board = this.current();
    if (!board) throw new Error('The board is not loaded yet');
    return board.id;
  }

  private async run(key: string, work: (boardId: string) => Promise<void>): Promise<void> {
    this.busyKeys.update((s) => new Set(s).add(key));
    try {
      await work(this.requireId());
    } finally {
      this.busyKeys.update((s) => {
        const next = new Set(s);
        next.delete(key);
        return next;
      });
    }
  }
}
