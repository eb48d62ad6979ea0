import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { JobDetail } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import { officeWords } from '../../shared/testing/office-words';
import { JobStatusActions } from './job-status-actions';

const JOB: JobDetail = {
  id: 'job-1',
  title: 'Hall in lime plaster',
  clientId: 'c1',
  clientName: 'Ada Ward',
  optionLabel: 'Option A',
  contractSum: '12000.00',
  currency: 'USD',
  status: 'in_progress',
  startDate: null,
  finishDate: null,
  createdAt: '2026-11-01T10:00:00.000Z',
  estimateId: 'e1',
  proposalVersionId: 'v1',
  siteId: 's1',
  siteAddress: '1 Round Row',
  inquiryId: null,
  acceptedVariantId: 'A',
  paymentSchedule: [],
};

async function render(job: JobDetail) {
  TestBed.configureTestingModule({
    providers: [provideTestI18n(officeWords), provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting()],
  });
  const fixture = TestBed.createComponent(JobStatusActions);
  fixture.componentRef.setInput('job', job);
  const moved: JobDetail[] = [];
  fixture.componentInstance.changed.subscribe((j) => moved.push(j));
  await fixture.whenStable();
  const host = fixture.nativeElement as HTMLElement;
  const button = (words: string) => [...host.querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes(words));
  const settle = async () => {
    await new Promise((resolve) => setTimeout(resolve, 0));
    await fixture.whenStable();
  };
  return { fixture, host, button, moved, settle, http: TestBed.inject(HttpTestingController) };
}

describe('JobStatusActions', () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('marks a job under way finished', async () => {
    const { button, http, moved, settle } = await render(JOB);
    button('Mark the job finished')!.click();
    const req = http.expectOne({ method: 'POST', url: '/api/jobs/job-1/status' });
    expect(req.request.body).toEqual({ status: 'complete' });
    req.flush({ ...JOB, status: 'complete' });
    await settle();
    expect(moved.map((j) => j.status)).toEqual(['complete']);
  });

  it('cancels only with a reason, and shows the server’s refusal', async () => {
    const { host, button, http, settle, fixture } = await render(JOB);
    button('Cancel the job…')!.click();
    await settle();
    button('Cancel the job')!.click();
    fixture.detectChanges();
    http.expectNone({ method: 'POST', url: '/api/jobs/job-1/status' });
    const reason = host.querySelector<HTMLTextAreaElement>('textarea[formcontrolname="reason"]')!;
    reason.value = 'The client moved house';
    reason.dispatchEvent(new Event('input'));
    host.querySelector('form')!.dispatchEvent(new Event('submit'));
    const req = http.expectOne({ method: 'POST', url: '/api/jobs/job-1/status' });
    expect(req.request.body).toEqual({ status: 'cancelled', reason: 'The client moved house' });
    req.flush(
      { type: 'about:blank', title: 'Conflict', status: 409, detail: "Void the job's invoices first: INV-0001.", errors: [] },
      { status: 409, statusText: 'Conflict' },
    );
    await settle();
    expect(host.textContent).toContain('INV-0001');
  });

  it('offers reopening on a finished job and nothing on a cancelled one', async () => {
    const finished = await render({ ...JOB, status: 'complete' });
    expect(finished.button('Reopen the job')).toBeDefined();
    expect(finished.button('Mark the job finished')).toBeUndefined();
    TestBed.resetTestingModule();
    const cancelled = await render({ ...JOB, status: 'cancelled' });
    expect(cancelled.host.querySelectorAll('button')).toHaveLength(0);
    expect(cancelled.host.textContent).toContain('This job was cancelled');
  });
});
