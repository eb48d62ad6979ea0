import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';

/** A client's project as the portal lists it. The API returns none yet; the shape grows with it. */
export interface PortalProject {
  readonly id: string;
  readonly title: string;
}

@Injectable({ providedIn: 'root' })
export class ProjectsApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<readonly PortalProject[]> {
    const answer = await firstValueFrom(this.http.get<{ projects: PortalProject[] }>('/api/portal/projects'));
    return answer.projects;
  }
}
