import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { describe, expect, it } from 'vitest';
import { DepositReady } from './deposit-ready';

describe('the deposit invoice right after accepting', () => {
  it('links to the invoice to pay it now', async () => {
    TestBed.configureTestingModule({ providers: [provideTestI18n({ proposals }), provideRouter([])] });
    const fixture = TestBed.createComponent(DepositReady);
    fixture.componentRef.setInput('invoiceId', 'inv-1');
    fixture.componentRef.setInput('firmName', 'Quillfeather Finishes');
    await fixture.whenStable();
    const html = fixture.nativeElement as HTMLElement;
    const link = html.querySelector('a');
    expect(link?.textContent?.trim()).toContain('Pay the deposit now');
    expect(link?.getAttribute('href')).toBe('/invoices/inv-1');
    expect(html.textContent).toContain('Quillfeather Finishes has sent you the deposit invoice by e-mail.');
  });
});
