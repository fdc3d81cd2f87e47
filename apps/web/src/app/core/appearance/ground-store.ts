import { DOCUMENT } from '@angular/common';
import { effect, inject, Injectable, signal } from '@angular/core';

/** The page ground: paper white or dark. Drawings are ink on whichever is chosen. */
export type Ground = 'paper' | 'dark';
const STORAGE_KEY = 'barwright.ground';

@Injectable({ providedIn: 'root' })
export class GroundStore {
  private readonly document = inject(DOCUMENT);
  private readonly current = signal<Ground>(this.initialGround());

  readonly ground = this.current.asReadonly();

  constructor() {
    effect(() => {
      const ground = this.current();
      this.document.documentElement.classList.toggle('bw-dark', ground === 'dark');
      try {
        this.document.defaultView?.localStorage.setItem(STORAGE_KEY, ground);
      } catch {
        // Storage can be off (private mode); the choice then lasts for this visit only.
      }
    });
  }

  toggle(): void {
    this.current.update((g) => (g === 'dark' ? 'paper' : 'dark'));
  }

  private initialGround(): Ground {
    const view = this.document.defaultView;
    try {
      const stored = view?.localStorage.getItem(STORAGE_KEY);
      if (stored === 'paper' || stored === 'dark') return stored;
    } catch {
      // fall through to the system preference
    }
    return view?.matchMedia?.('(prefers-color-scheme: dark)').matches ? 'dark' : 'paper';
  }
}
