import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef } from '@angular/core';
import { DeferBlockBehavior, TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { PortalProposal } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import common from '../../../../../shared/i18n/words/common/en.json';
import proposals from '../../../i18n/proposals/en.json';
import { proposalUrl } from './proposal-api';
import { ProposalPage } from './proposal-page';
import { SNAPSHOT } from './proposal-fixtures';

/** An invented proposal, sent and the newest; `isExpired` as the server says for the firm's day. */
const proposal = (isExpired: boolean): PortalProposal => ({
  id: 'ver-1',
  version: 1,
  status: 'sent',
  expiresOn: '2026-11-30',
  isExpired,
  isLatest: true,
  snapshot: { ...SNAPSHOT, title: 'Stair hall, lime plaster', expiresOn: '2026-11-30' },
  decidedAt: null,
  timeZone: 'America/New_York',
  acceptedVariantId: null,
  acceptedAddOnIds: [],
  signedName: null,
  clientComment: '',
});

async function render(answer: PortalProposal) {
  TestBed.configureTestingModule({
    // The document is a deferred block (hydrated later in the browser); what is asserted here is outside it.
    deferBlockBehavior: DeferBlockBehavior.Manual,
    imports: [ProposalPage],
    providers: [provideTestI18n({ proposals, common }), provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
  });
  await TestBed.compileComponents();
  const fixture = TestBed.createComponent(ProposalPage);
  fixture.componentRef.setInput('id', 'ver-1');
  TestBed.inject(ApplicationRef).tick();
  TestBed.inject(HttpTestingController).expectOne(proposalUrl('ver-1')).flush(answer);
  await fixture.whenStable();
  fixture.detectChanges();
  return fixture.nativeElement as HTMLElement;
}

describe('a proposal past its expiry day', () => {
  it('can no longer be accepted, but the client can still ask for changes or a new one', async () => {
    const html = await render(proposal(true));
    expect(html.textContent).toContain('it can no longer be accepted');
    expect(html.querySelector('lb-acceptance-form')).toBeNull();
    expect(html.querySelector('.answer h2')?.textContent?.trim()).toBe('Ask for a new proposal');
    expect(html.querySelector('lb-answer-forms')).not.toBeNull();
  });

  it('before that day, the acceptance form is there', async () => {
    const html = await render(proposal(false));
    expect(html.querySelector('lb-acceptance-form')).not.toBeNull();
  });
});

describe('an accepted proposal', () => {
  it('says when it was signed in the firm’s own time, as the signed copy does, wherever the page is drawn', async () => {
    const html = await render({
      ...proposal(false),
      status: 'accepted',
      decidedAt: '2026-12-01T15:00:00.000Z',
      signedName: 'Hattie Brambleton',
      acceptedVariantId: 'A',
    });
    // 15:00 UTC is 10:00 in New York (EST, UTC−5 in December).
    expect(html.textContent).toContain('Accepted by Hattie Brambleton on December 1, 2026');
    expect(html.textContent).toMatch(/10:00\sAM/);
  });
});
