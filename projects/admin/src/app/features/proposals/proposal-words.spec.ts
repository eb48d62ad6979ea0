import { PROPOSAL_VERSION_STATUSES } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { DEFAULT_TERMS_TEXT, PROGRESS_PAYMENT_HINT, versionStatus } from './proposal-words';

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

describe('payment wording', () => {
  it('speaks of the progress payment as its payment line does, never of "base coats"', () => {
    for (const text of [DEFAULT_TERMS_TEXT, PROGRESS_PAYMENT_HINT]) {
      expect(text).toContain('layer named in');
      expect(text).not.toMatch(/base (coats|layers)/);
    }
  });
});
