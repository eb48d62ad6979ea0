import { httpResource } from '@angular/common/http';
import { Injectable, computed } from '@angular/core';
import { roleAtLeast, type ItemList, type TeamMember } from '@layerbook/contracts/types';

export interface Assignee {
  readonly userId: string;
  readonly name: string;
}

/**
 * People an inquiry can be given to: the firm's active owners and office (crew cannot open
 * inquiries, and the API refuses them), read once per visit. Without the list the selects offer
 * only "Nobody yet"; a saved assignee still shows by name.
 */
@Injectable({ providedIn: 'root' })
export class Assignees {
  private readonly team = httpResource<ItemList<TeamMember>>(() => '/api/team/members');
  private readonly members = computed(() => (this.team.hasValue() ? this.team.value().items : []));

  readonly active = computed(() => assignable(this.members()));

  /** Names for the activity log, which stores user ids; includes people since deactivated. */
  nameOf(userId: unknown): string | null {
    return this.members().find((member) => member.userId === userId)?.name ?? null;
  }
}

/** Active owners and office members, as the API's assignee check takes them. */
export function assignable(members: readonly TeamMember[]): readonly Assignee[] {
  return members
    .filter((member) => member.status === 'active' && roleAtLeast(member.role, 'office'))
    .map((member) => ({ userId: member.userId, name: member.name }));
}
