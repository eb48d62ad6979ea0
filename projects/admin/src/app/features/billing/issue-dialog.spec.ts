import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MAT_DIALOG_DATA, MatDialogRef } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { InvoiceDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { progressDraft } from './invoice-fixtures';
import { IssueDialog } from './issue-dialog';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';

function render(invoice: InvoiceDetail) {
  const close = vi.fn();
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n(officeWords),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      { provide: MAT_DIALOG_DATA, useValue: { invoice } },
      { provide: MatDialogRef, useValue: { close } },
    ],
  });
  const fixture = TestBed.createComponent(IssueDialog);
  fixture.detectChanges();
  const html = fixture.nativeElement as HTMLElement;
  const submit = () => html.querySelector('form')!.dispatchEvent(new Event('submit'));
  return { fixture, html, submit, close, http: TestBed.inject(HttpTestingController) };
}

describe('the issue dialog', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('issues dated today in the firm’s zone (no date sent) and e-mailed, then closes with the number taken', async () => {
    const { fixture, html, submit, close, http } = render(progressDraft);
    expect(html.textContent).toContain('E-mail it to the client (ada@example.com)');
    submit();
    const issue = http.expectOne({ method: 'POST', url: '/api/invoices/inv-2/issue' });
    // the total the office read goes with it: the server issues nothing else
    expect(issue.request.body).toEqual({ send: true, expectedTotal: '1350.00' });
    const issued = { ...progressDraft, number: 'INV-0008', status: 'issued' as const };
    issue.flush(issued);
    await fixture.whenStable();
    expect(close).toHaveBeenCalledWith({ invoice: issued, isEmailed: true });
  });

  it('does not offer the e-mail when the client has no address', () => {
    const noEmail = { ...progressDraft, document: { ...progressDraft.document, client: { ...progressDraft.document.client, email: '' } } };
    const { html, submit, http } = render(noEmail);
    expect(html.querySelector('mat-checkbox')).toBeNull();
    expect(html.textContent).toContain('The client has no e-mail address on file');
    submit();
    const issue = http.expectOne({ method: 'POST', url: '/api/invoices/inv-2/issue' });
    expect(issue.request.body).toEqual({ send: false, expectedTotal: '1350.00' });
    issue.flush(progressDraft);
  });

  it('when the server figures another total at issue: shows the draft figured again, says why, and confirms the new total', async () => {
    const { fixture, html, submit, close, http } = render(progressDraft);
    expect(html.textContent).toContain('Ada Ward will owe $1,350.00.');
    submit();
    const message =
      "This invoice now comes to 1200.00, not the 1350.00 you confirmed: the job's figures changed since it was drafted. Check the new total, then issue it.";
    http
      .expectOne({ method: 'POST', url: '/api/invoices/inv-2/issue' })
      .flush(
        { type: 'about:blank', title: message, status: 409, detail: message, errors: [{ field: 'expectedTotal', message }] },
        { status: 409, statusText: 'Conflict' },
      );
    await Promise.resolve();
    const refigure = http.expectOne({ method: 'PATCH', url: '/api/invoices/inv-2' });
    expect(refigure.request.body).toEqual({ periodEnd: '2026-11-30' });
    refigure.flush({ ...progressDraft, subtotal: '1200.00', total: '1200.00', amountDue: '1200.00' });
    await fixture.whenStable();
    fixture.detectChanges();
    expect(close).not.toHaveBeenCalled();
    expect(html.textContent).toContain('Ada Ward will owe $1,200.00.');
    expect(html.textContent).toContain(message);
    submit();
    const again = http.expectOne({ method: 'POST', url: '/api/invoices/inv-2/issue' });
    expect(again.request.body).toEqual({ send: true, expectedTotal: '1200.00' });
    again.flush({ ...progressDraft, number: 'INV-0008', status: 'issued', total: '1200.00' });
    await fixture.whenStable();
    expect(close).toHaveBeenCalled();
  });
});
