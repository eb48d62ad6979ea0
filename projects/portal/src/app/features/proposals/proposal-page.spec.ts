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
