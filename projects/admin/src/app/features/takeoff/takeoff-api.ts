import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { RoomInput, RoomUpdate, RoomView, SurfaceInput, SurfaceUpdate, SurfaceView, TakeoffView } from '@layerbook/contracts/types';

const id = (value: string) => encodeURIComponent(value);

/** A site's takeoff, read by the page through httpResource. */
export const takeoffUrl = (siteId: string) => `/api/takeoff/sites/${id(siteId)}`;

/** The takeoff's writes (/api/takeoff); every write answers with what changed, the page reloads the whole view. */
@Injectable({ providedIn: 'root' })
export class TakeoffApi {
  private readonly http = inject(HttpClient);

  addRoom(siteId: string, body: RoomInput): Promise<RoomView> {
    return firstValueFrom(this.http.post<RoomView>(`${takeoffUrl(siteId)}/rooms`, body));
  }

  updateRoom(roomId: string, body: RoomUpdate): Promise<RoomView> {
    return firstValueFrom(this.http.patch<RoomView>(`/api/takeoff/rooms/${id(roomId)}`, body));
  }

  deleteRoom(roomId: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/takeoff/rooms/${id(roomId)}`));
  }

  moveRoom(roomId: string, to: number): Promise<TakeoffView> {
    return firstValueFrom(this.http.post<TakeoffView>(`/api/takeoff/rooms/${id(roomId)}/move`, { to }));
  }

  addSurface(roomId: string, body: SurfaceInput): Promise<SurfaceView> {
    return firstValueFrom(this.http.post<SurfaceView>(`/api/takeoff/rooms/${id(roomId)}/surfaces`, body));
  }

  updateSurface(surfaceId: string, body: SurfaceUpdate): Promise<SurfaceView> {
    return firstValueFrom(this.http.patch<SurfaceView>(`/api/takeoff/surfaces/${id(surfaceId)}`, body));
  }

  deleteSurface(surfaceId: string): Promise<unknown> {
    return firstValueFrom(this.http.delete(`/api/takeoff/surfaces/${id(surfaceId)}`));
  }

  duplicateSurface(surfaceId: string): Promise<SurfaceView> {
    return firstValueFrom(this.http.post<SurfaceView>(`/api/takeoff/surfaces/${id(surfaceId)}/duplicate`, {}));
  }

  moveSurface(surfaceId: string, to: number): Promise<TakeoffView> {
    return firstValueFrom(this.http.post<TakeoffView>(`/api/takeoff/surfaces/${id(surfaceId)}/move`, { to }));
  }
}
