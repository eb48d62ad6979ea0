import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { PortalProject, PortalProjects } from '@layerbook/contracts';

@Injectable({ providedIn: 'root' })
export class ProjectsApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<readonly PortalProject[]> {
    const answer = await firstValueFrom(this.http.get<PortalProjects>('/api/portal/projects'));
    return answer.projects;
  }
}
