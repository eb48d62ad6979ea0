import { PROPOSAL_VERSION_STATUSES } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { versionStatus } from './proposal-words';

describe('versionStatus', () => {
  it.each([
    ['draft', 'Draft', 'edit_note'],
    ['sent', 'Sent', 'outgoing_mail'],
    ['superseded', 'Replaced by a newer version', 'history'],
  ] as const)('%s reads "%s" beside the %s icon', (status, word, icon) => {
    expect(versionStatus(status)).toEqual({ word, icon });
  });

  it('has words and an icon for every status', () => {
    for (const status of PROPOSAL_VERSION_STATUSES) {
      expect(versionStatus(status).word).not.toBe('');
      expect(versionStatus(status).icon).not.toBe('');
    }
  });
});
