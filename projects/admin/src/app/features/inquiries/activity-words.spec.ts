import type { InquiryActivity } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { describeActivity } from './activity-words';

const names: Record<string, string> = { u1: 'Olive Owner' };
const nameOf = (userId: unknown) => (typeof userId === 'string' ? (names[userId] ?? null) : null);
const formatDate = (day: string) => `on ${day}`;

function entry(kind: InquiryActivity['kind'], data: Record<string, unknown> = {}, body = ''): InquiryActivity {
  return { id: 'x', kind, body, data, actorName: null, createdAt: '2026-03-01T10:00:00.000Z' };
}

describe('describeActivity', () => {
  it.each([
    ['a web inquiry', entry('created', { source: 'web_form' }), 'add_circle', 'Inquiry logged (Inquiry form)', ''],
    ['an inquiry with an unknown source', entry('created', { source: 'fax' }), 'add_circle', 'Inquiry logged', ''],
    ['a note', entry('note', {}, 'Wants limewash'), 'sticky_note_2', 'Note', 'Wants limewash'],
    ['a call', entry('call', {}, 'Voicemail'), 'call', 'Call', 'Voicemail'],
    ['an e-mail', entry('email', {}, 'Sent photos'), 'mail', 'E-mail', 'Sent photos'],
    ['a stage move', entry('stage_change', { from: 'new', to: 'visit_booked' }), 'swap_horiz', 'Stage: New → Site visit booked', ''],
    [
      'a loss with its reason',
      entry('stage_change', { from: 'samples', to: 'lost' }, 'Too dear'),
      'swap_horiz',
      'Stage: Samples → Lost',
      'Reason: Too dear',
    ],
    ['a move from a stage no longer known', entry('stage_change', { from: 'quoted', to: 'won' }), 'swap_horiz', 'Stage: unknown → Won', ''],
    ['an assignment', entry('assignment', { from: null, to: 'u1' }), 'person', 'Assigned to Olive Owner', ''],
    ['an assignment to someone gone', entry('assignment', { to: 'u9' }), 'person', 'Assigned to someone no longer on the team', ''],
    ['an unassignment', entry('assignment', { from: 'u1', to: null }), 'person', 'No longer assigned to anyone', ''],
    ['a first follow-up', entry('follow_up', { from: null, to: '2026-03-14' }), 'event', 'Follow-up set for on 2026-03-14', ''],
    [
      'a moved follow-up',
      entry('follow_up', { from: '2026-03-14', to: '2026-03-20' }),
      'event',
      'Follow-up moved from on 2026-03-14 to on 2026-03-20',
      '',
    ],
    ['a cleared follow-up', entry('follow_up', { from: '2026-03-14', to: null }), 'event', 'Follow-up date cleared', ''],
    ['filing as a client', entry('converted', { clientId: 'c1' }), 'folder_shared', 'Filed as a client', ''],
  ])('says %s', (_case, activity, icon, title, body) => {
    expect(describeActivity(activity, nameOf, formatDate)).toEqual({ icon, title, body });
  });
});
