import { httpResource } from '@angular/common/http';
import { Injectable, computed } from '@angular/core';
import type { ItemList, TeamMember } from '@layerbook/contracts/types';

export interface Assignee {
  readonly userId: string;
  readonly name: string;
}

/**
 * People an inquiry can be given to: the firm's active members, read once per visit. Without the
 * list the selects offer only "Nobody yet"; a saved assignee still shows by name.
 */
@Injectable({ providedIn: 'root' })
export class Assignees {
  private readonly team = httpResource<ItemList<TeamMember>>(() => '/api/team/members');
  private readonly members = computed(() => (this.team.hasValue() ? this.team.value().items : []));

  readonly active = computed<readonly Assignee[]>(() =>
    this.members()
      .filter((member) => member.status === 'active')
      .map((member) => ({ userId: member.userId, name: member.name })),
  );

  /** Names for the activity log, which stores user ids; includes people since deactivated. */
  nameOf(userId: unknown): string | null {
    return this.members().find((member) => member.userId === userId)?.name ?? null;
  }
}
