import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { ApplicationRef, RESPONSE_INIT } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { ClientBoardView } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import billing from '../../../i18n/billing/en.json';
import layout from '../../../i18n/layout/en.json';
import problems from '../../../i18n/problems/en.json';
import proposals from '../../../i18n/proposals/en.json';
import samples from '../../../i18n/samples/en.json';
import { BoardPage } from './board-page';

/** An invented board as the API answers it; the server writes its steps in the client's language. */
const board = (finishSteps: string[]): ClientBoardView => ({
  id: 'b-1',
  label: 'Stair hall, board A',
  round: 1,
  status: 'shown',
  firmName: 'Ochre Lane Finishes',
  finishName: 'Antiqued glaze over primer',
  finishSteps,
  clientComment: '',
  decidedAt: null,
  timeZone: 'America/New_York',
  photos: [],
});

function render() {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ samples, proposals, billing, layout, problems, common }),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  const fixture = TestBed.createComponent(BoardPage);
  document.body.appendChild(fixture.nativeElement as HTMLElement);
  fixture.componentRef.setInput('id', 'b-1');
  TestBed.inject(ApplicationRef).tick();
  const http = TestBed.inject(HttpTestingController);
  const html = fixture.nativeElement as HTMLElement;
  const steps = () => [...html.querySelectorAll('ol.steps li')].map((li) => li.textContent?.trim());
  return { fixture, http, html, steps };
}

describe('a sample board in the portal', () => {
  it('shows the steps as the server wrote them, and reads them again when the client’s language changes', async () => {
    const { fixture, http, steps } = render();
    http.expectOne('/api/portal/boards/b-1').flush(board(['1. Primer: Acrylic primer, rolled on, one coat.']));
    await fixture.whenStable();
    fixture.detectChanges();
    expect(steps()).toEqual(['1. Primer: Acrylic primer, rolled on, one coat.']);

    await TestBed.inject(Language).use('es');
    TestBed.inject(ApplicationRef).tick();
    http.expectOne('/api/portal/boards/b-1').flush(board(['1. Primer: Acrylic primer, con rodillo, una mano.']));
    await fixture.whenStable();
    fixture.detectChanges();
    expect(steps()).toEqual(['1. Primer: Acrylic primer, con rodillo, una mano.']);
    http.verify();
  });

  it('says an answer given elsewhere in the portal’s words, and shows the board as it now stands', async () => {
    const { fixture, http, html } = render();
    http.expectOne('/api/portal/boards/b-1').flush(board([]));
    await fixture.whenStable();
    fixture.detectChanges();
    [...html.querySelectorAll('button')].find((b) => b.textContent?.includes('Approve this board'))!.click();
    fixture.detectChanges();
    [...html.querySelectorAll('button')].find((b) => b.textContent?.includes('Yes, approve this board'))!.click();
    http
      .expectOne({ method: 'POST', url: '/api/portal/boards/b-1/approve' })
      .flush(
        { type: 'https://layerbook.local/problems/409', title: 'Conflict', status: 409, detail: 'You have already approved this board.' },
        { status: 409, statusText: 'Conflict' },
      );
    // The refusal is handled once the rejected call settles; the page then reads the board again.
    await new Promise((resolve) => setTimeout(resolve));
    TestBed.inject(ApplicationRef).tick();
    expect(html.querySelector('.error[role="alert"]')?.textContent).toBe(problems.boardDecided);
    http.expectOne('/api/portal/boards/b-1').flush({ ...board([]), status: 'approved', decidedAt: '2026-03-04T15:30:00Z' });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.textContent).toContain('You approved this board on');
    http.verify();
  });

  it('sends a request for changes from its form without the browser posting the page, and refuses a blank one', async () => {
    const { fixture, http, html } = render();
    http.expectOne('/api/portal/boards/b-1').flush(board([]));
    await fixture.whenStable();
    fixture.detectChanges();
    [...html.querySelectorAll('button')].find((b) => b.textContent?.includes(proposals.answers.askChanges))!.click();
    fixture.detectChanges();
    const form = html.querySelector('section.answer form') as HTMLFormElement;
    const submit = () => {
      // A form Angular does not own would be posted by the browser (the page reloads, the text is lost).
      const event = new Event('submit', { cancelable: true });
      form.dispatchEvent(event);
      return event.defaultPrevented;
    };
    expect(submit()).toBe(true);
    fixture.detectChanges();
    expect(html.querySelector('mat-error')?.textContent).toContain(samples.board.commentRequired);
    http.expectNone({ method: 'POST' });

    const textarea = form.querySelector('textarea')!;
    textarea.value = '  A little less gold in the glaze, please.  ';
    textarea.dispatchEvent(new Event('input'));
    expect(submit()).toBe(true);
    const sent = http.expectOne({ method: 'POST', url: '/api/portal/boards/b-1/request-changes' });
    expect(sent.request.body).toEqual({ comment: 'A little less gold in the glaze, please.' });
    sent.flush({ ...board([]), status: 'changes_requested', clientComment: 'A little less gold in the glaze, please.' });
    http.verify();
  });

  it('moves focus to the question on Approve, then to the answer, said in a status region that was there, empty, before', async () => {
    const { fixture, http, html } = render();
    http.expectOne('/api/portal/boards/b-1').flush(board([]));
    await fixture.whenStable();
    fixture.detectChanges();
    const outcome = html.querySelector<HTMLElement>('[role=status]')!;
    expect(outcome.textContent?.trim()).toBe('');
    [...html.querySelectorAll('button')].find((b) => b.textContent?.includes('Approve this board'))!.click();
    await fixture.whenStable();
    fixture.detectChanges();
    expect(document.activeElement?.textContent).toContain(samples.board.yes);
    (document.activeElement as HTMLButtonElement).click();
    http
      .expectOne({ method: 'POST', url: '/api/portal/boards/b-1/approve' })
      .flush({ ...board([]), status: 'approved', decidedAt: '2026-03-04T15:30:00Z' });
    await vi.waitFor(() => {
      fixture.detectChanges();
      expect(document.activeElement).toBe(outcome);
    });
    expect(html.querySelector('[role=status]')).toBe(outcome);
    expect(outcome.textContent).toContain('You approved this board on');
    fixture.nativeElement.remove();
    http.verify();
  });

  it('says the day it was answered in the firm’s time zone, not the server’s or the browser’s', async () => {
    const { fixture, http, html } = render();
    // 03:30 on March 4 in UTC is still March 3 in Los Angeles
    http.expectOne('/api/portal/boards/b-1').flush({
      ...board([]),
      status: 'approved',
      decidedAt: '2026-03-04T03:30:00Z',
      timeZone: 'America/Los_Angeles',
    });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role=status]')?.textContent).toContain('March 3, 2026');
    fixture.nativeElement.remove();
  });

  it.each([
    [400, 'a link cut short'],
    [404, 'a board that is not theirs'],
  ])('answers %s (%s) with the not-found words, a 404 on the server render and a way back to the boards', async (status) => {
    const init: { status?: number } = {};
    TestBed.configureTestingModule({ providers: [{ provide: RESPONSE_INIT, useValue: init }] });
    const { fixture, http, html } = render();
    http.expectOne('/api/portal/boards/b-1').flush({ type: 'about:blank', title: 'x', status, detail: 'x' }, { status, statusText: 'x' });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(html.querySelector('[role=alert]')?.textContent).toContain(samples.board.missing);
    expect(html.querySelector('a[href="/boards"]')).not.toBeNull();
    expect(init.status).toBe(404);
    fixture.nativeElement.remove();
  });
});
