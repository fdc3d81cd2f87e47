import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Rack, RackRosette, RackRosetteBody, RackRosettePatch, RackShop, RackShopBody } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** The member's own rack at /api/rack (the server answers only for the signed-in member). */
@Injectable({ providedIn: 'root' })
export class RackApi {
  private readonly http = inject(HttpClient);

  read(): Promise<Rack> {
    return firstValueFrom(this.http.get<Rack>('/api/rack'));
  }

  addRosette(body: RackRosetteBody): Promise<RackRosette> {
    return firstValueFrom(this.http.post<RackRosette>('/api/rack/rosettes', body));
  }

  changeRosette(id: string, patch: RackRosettePatch): Promise<RackRosette> {
    return firstValueFrom(this.http.patch<RackRosette>(`/api/rack/rosettes/${encodeURIComponent(id)}`, patch));
  }

  removeRosette(id: string): Promise<void> {
    return firstValueFrom(this.http.delete<void>(`/api/rack/rosettes/${encodeURIComponent(id)}`));
  }

  saveShop(shop: RackShopBody): Promise<RackShop> {
    return firstValueFrom(this.http.put<RackShop>('/api/rack/shop', shop));
  }

  /** Replaces the whole rack with a rack file; a refused file names its fields and nothing is stored. */
  importFile(file: unknown): Promise<Rack> {
    return firstValueFrom(this.http.post<Rack>('/api/rack/import', file));
  }
}
