import { HttpClient } from '@angular/common/http';
import { Injectable, inject, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { TeamMember, TeamView } from '@layerbook/contracts';

export interface Assignee {
  readonly userId: string;
  readonly name: string;
}

/** People an inquiry can be given to: the firm's active members. Loaded once per visit. */
@Injectable({ providedIn: 'root' })
export class Assignees {
  private readonly http = inject(HttpClient);
  private readonly members = signal<readonly TeamMember[]>([]);
  private pending: Promise<void> | null = null;

  readonly active = signal<readonly Assignee[]>([]);

  load(): Promise<void> {
    if (this.members().length > 0) {
      return Promise.resolve();
    }
    this.pending ??= firstValueFrom(this.http.get<TeamView>('/api/team'))
      .then(
        (team) => {
          this.members.set(team.members);
          this.active.set(
            team.members
              .filter((member) => member.status === 'active')
              .map((member) => ({ userId: member.userId, name: member.name })),
          );
        },
        // Without the list the select offers only "Nobody yet"; the saved assignee still shows by name.
        () => undefined,
      )
      .finally(() => (this.pending = null));
    return this.pending;
  }

  /** Names for the activity log, which stores user ids; includes people since deactivated. */
  nameOf(userId: unknown): string | null {
    return this.members().find((member) => member.userId === userId)?.name ?? null;
  }
}
