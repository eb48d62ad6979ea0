import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import { NewEstimate } from './new-estimate';

const SITE = { id: 's1', clientId: 'c1', label: '', addressLine1: '24 Thistledown Lane', city: 'Marrowby' };
const CLIENT = {
  id: 'c1',
  name: 'Hattie Brambleton',
  email: 'h@example.test',
  sites: [{ ...SITE }, { ...SITE, id: 's2', addressLine1: '3 Mill Row' }],
};
const INQUIRY = { id: 'i1', contactName: 'Hattie Brambleton', clientId: 'c1', siteId: 's2', finishIdea: 'Limewash in the stair hall' };

function render(inquiry?: string) {
  TestBed.configureTestingModule({
    providers: [
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideTestI18n({ proposals }),
    ],
  });
  const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
  const fixture = TestBed.createComponent(NewEstimate);
  if (inquiry) fixture.componentRef.setInput('inquiry', inquiry);
  fixture.detectChanges();
  return { fixture, navigate, http: TestBed.inject(HttpTestingController), host: fixture.nativeElement as HTMLElement };
}

const settle = async (fixture: ReturnType<typeof render>['fixture']) => {
  await new Promise((resolve) => setTimeout(resolve, 0));
  fixture.detectChanges();
  await fixture.whenStable();
};

describe('a new estimate started from an inquiry', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it("starts from the inquiry's client, site and finish idea, says so, and ties the estimate to the inquiry", async () => {
    const { fixture, http, host, navigate } = render('i1');
    http.expectOne('/api/inquiries/i1').flush(INQUIRY);
    await settle(fixture);
    http.expectOne('/api/clients/c1').flush(CLIENT);
    await settle(fixture);
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="client"]')?.value).toBe('Hattie Brambleton');
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="title"]')?.value).toBe('Limewash in the stair hall');
    expect(host.querySelector('.lb-notice')?.textContent).toContain('For the inquiry from Hattie Brambleton');
    host.querySelector<HTMLFormElement>('form')!.dispatchEvent(new Event('submit'));
    await settle(fixture);
    const made = http.expectOne({ method: 'POST', url: '/api/estimates' });
    expect(made.request.body).toMatchObject({ siteId: 's2', inquiryId: 'i1', title: 'Limewash in the stair hall' });
    made.flush({ id: 'e1' });
    await settle(fixture);
    expect(navigate).toHaveBeenCalledWith(['/estimates', 'e1']);
  });

  it('asks for nothing when opened on its own', () => {
    const { http } = render();
    http.expectNone('/api/inquiries/i1');
  });
});
