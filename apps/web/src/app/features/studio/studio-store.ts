import { computed, inject, Injectable, signal } from '@angular/core';
import type { DesignMeta, DesignVersion } from '@barwright/contracts';
import { StudioApi } from './studio-api';

/** The studio's server-side facts about one design: its title, board and your role, and its saved versions. */
@Injectable()
export class StudioStore {
  private readonly api = inject(StudioApi);
  private readonly currentMeta = signal<DesignMeta | null>(null);
  private readonly versionList = signal<readonly DesignVersion[]>([]);
  private readonly versionsFetched = signal(false);
  private designId = '';

  readonly meta = this.currentMeta.asReadonly();
  readonly versions = this.versionList.asReadonly();
  readonly versionsLoaded = this.versionsFetched.asReadonly();
  /** Editors and the owner change the design; viewers follow. */
  readonly canEdit = computed(() => {
    const role = this.currentMeta()?.role;
    return role === 'owner' || role === 'editor';
  });

  async load(designId: string): Promise<void> {
    this.designId = designId;
    this.currentMeta.set(await this.api.meta(designId));
    void this.loadVersions();
  }

  async loadVersions(): Promise<void> {
    this.versionList.set(await this.api.versions(this.designId));
    this.versionsFetched.set(true);
  }

  async rename(title: string): Promise<void> {
    const summary = await this.api.rename(this.designId, title);
    this.currentMeta.update((m) => (m ? { ...m, title: summary.title, updatedAt: summary.updatedAt } : m));
  }

  async saveVersion(name: string): Promise<DesignVersion> {
    const version = await this.api.saveVersion(this.designId, name);
    this.versionList.update((list) => [version, ...list]);
    return version;
  }

  versionContent(versionId: string) {
    return this.api.version(this.designId, versionId);
  }

  restoreVersion(versionId: string): Promise<void> {
    return this.api.restoreVersion(this.designId, versionId);
  }

  exportFile(format: Parameters<StudioApi['export']>[1]) {
    return this.api.export(this.designId, format);
  }
}
