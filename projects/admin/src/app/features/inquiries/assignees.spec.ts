import type { TeamMember } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { assignable } from './assignees';

const member = (name: string, role: TeamMember['role'], status: TeamMember['status'] = 'active'): TeamMember => ({
  id: `m-${name}`,
  userId: `u-${name}`,
  name,
  email: `${name}@example.test`,
  role,
  status,
  isYou: false,
  language: null,
  hasSecondFactor: false,
});

describe('assignable', () => {
  it('offers active owners and office only: crew cannot open inquiries, and the API refuses them', () => {
    const team = [member('Ines', 'owner'), member('Oswin', 'office'), member('Cato', 'crew'), member('Lena', 'office', 'deactivated')];
    expect(assignable(team)).toEqual([
      { userId: 'u-Ines', name: 'Ines' },
      { userId: 'u-Oswin', name: 'Oswin' },
    ]);
  });
});
