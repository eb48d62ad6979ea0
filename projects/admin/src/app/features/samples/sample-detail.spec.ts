import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, type TestRequest } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed, type ComponentFixture } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { FinishSystemSummary, SampleBoardView, SampleStatus, StaffRole } from '@layerbook/contracts/types';
import { afterEach, describe, expect, it } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import samples from '../../../i18n/samples/en.json';
import ui from '../../../i18n/ui/en.json';
import { Session } from '../../core/auth/session';
import { staffSession } from '../../shared/testing/staff-session';
import { SampleDetail } from './sample-detail';

const at = '2026-01-05T09:00:00.000Z';
const BOARD: SampleBoardView = {
  id: 'b1',
  label: 'Hall board',
  round: 1,
  status: 'draft',
  clientId: 'c1',
  clientName: 'Wren Halloway',
  siteId: null,
  siteAddress: null,
  estimateId: null,
  finishSystemId: 'fs1',
  finish: { systemId: 'fs1', systemName: 'Antiqued glaze', description: '', takenAt: at, layers: [] },
  finishSteps: [],
  notes: 'Lot 2291',
  clientComment: '',
  decidedAt: null,
  decidedByName: null,
  hasNextRound: false,
  photos: [
    {
      id: 'p1',
      boardId: 'b1',
      caption: '',
      thumbnailUrl: '/api/files/f1/thumbnail',
      width: 64,
      height: 48,
      fileId: 'f1',
      originalName: 'board.jpg',
      downloadUrl: '/api/files/f1',
      createdAt: at,
    },
  ],
  createdAt: at,
  updatedAt: at,
};
const system = (id: string, name: string, layerCount: number): FinishSystemSummary => ({
  id,
  name,
  description: '',
  layerCount,
  totalWaitHours: 0,
  usesProducts: [],
  archivedAt: null,
  updatedAt: at,
});

async function render(status: SampleStatus, role: StaffRole = 'office') {
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ samples, common, ui }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
    ],
  });
  TestBed.inject(Session).accept(staffSession(role));
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(SampleDetail);
  fixture.componentRef.setInput('id', 'b1');
  fixture.detectChanges();
  http.expectOne('/api/samples/b1').flush({ ...BOARD, status });
  await settle(fixture);
  return { fixture, http, host: fixture.nativeElement as HTMLElement };
}

async function settle(fixture: ComponentFixture<SampleDetail>) {
  fixture.detectChanges();
  await fixture.whenStable();
  fixture.detectChanges();
}

/** The request once the page has sent it (after a dialog closes, say); the page is busy until it is answered, so not settled. */
async function sent(
  fixture: ComponentFixture<SampleDetail>,
  http: HttpTestingController,
  method: string,
  url: string,
): Promise<TestRequest> {
  for (let tries = 0; tries < 200; tries++) {
    fixture.detectChanges();
    TestBed.tick();
    const [found] = http.match({ method, url });
    if (found) return found;
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
  throw new Error(`${method} ${url} was never sent`);
}

const buttons = (root: ParentNode) => [...root.querySelectorAll<HTMLButtonElement>('button')];
const button = (root: ParentNode, words: string) => buttons(root).find((b) => b.textContent?.trim().endsWith(words));
const hasPhotoControls = (host: HTMLElement) => ({
  add: button(host, 'Add photos') !== undefined,
  delete: host.querySelector('[aria-label="Delete photo 1 of Hall board"]') !== null,
});

function type(host: HTMLElement, selector: string, text: string) {
  const box = host.querySelector<HTMLInputElement | HTMLTextAreaElement>(selector);
  if (!box) throw new Error(`no ${selector}`);
  box.value = text;
  box.dispatchEvent(new Event('input'));
}

// Rendering Material fields takes seconds in jsdom on a busy machine.
describe('SampleDetail', { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('a board being made: photos can be added and deleted, and its label, finish and notes edited (only what changed is sent)', async () => {
    const { fixture, http, host } = await render('draft');
    expect(hasPhotoControls(host)).toEqual({ add: true, delete: true });

    button(host, 'Edit the board')?.click();
    (await sent(fixture, http, 'GET', '/api/library/systems')).flush({
      items: [system('fs1', 'Antiqued glaze', 2), system('fs2', 'Limewash', 1)],
    });
    await settle(fixture);
    expect(host.querySelector<HTMLInputElement>('input[formcontrolname="label"]')?.value).toBe('Hall board');
    expect(host.querySelector('mat-select[formcontrolname="finishSystemId"]')?.textContent).toContain('Antiqued glaze (2 layers)');
    expect(host.querySelector<HTMLTextAreaElement>('textarea[formcontrolname="notes"]')?.value).toBe('Lot 2291');

    type(host, 'input[formcontrolname="label"]', 'Hall board A');
    button(host, 'Save changes')?.click();
    const refused = http.expectOne({ method: 'PATCH', url: '/api/samples/b1' });
    expect(refused.request.body).toEqual({ label: 'Hall board A' });
    // Shown meanwhile from another screen: the server's words go beside the label.
    refused.flush(
      {
        status: 409,
        title: 'Conflict',
        detail: 'The client has seen this board under its label, so it stays as shown.',
        errors: [{ field: 'label', message: 'The label of a board the client has seen cannot change.' }],
      },
      { status: 409, statusText: 'Conflict', headers: { 'content-type': 'application/problem+json' } },
    );
    await settle(fixture);
    expect(host.querySelector('mat-error')?.textContent).toContain('The label of a board the client has seen cannot change.');

    type(host, 'input[formcontrolname="label"]', 'Hall board B');
    button(host, 'Save changes')?.click();
    http.expectOne({ method: 'PATCH', url: '/api/samples/b1' }).flush({ ...BOARD, label: 'Hall board B' });
    await settle(fixture);
    expect(host.querySelector('h1')?.textContent).toBe('Hall board B');
    expect(host.querySelector('input[formcontrolname="label"]')).toBeNull();
  });

  it.each(['shown', 'changes_requested'] as const)(
    'a board the client has seen (%s): photos stay as shown, and only the notes can be edited',
    async (status) => {
      const { fixture, http, host } = await render(status);
      expect(hasPhotoControls(host)).toEqual({ add: false, delete: false });
      expect(host.textContent).toContain('The client has seen these photos, so they stay as they are.');
      expect(button(host, 'Edit the board')).toBeUndefined();

      button(host, 'Edit the notes')?.click();
      await settle(fixture);
      expect(host.querySelector('input[formcontrolname="label"]')).toBeNull();
      expect(host.querySelector('mat-select[formcontrolname="finishSystemId"]')).toBeNull();
      type(host, 'textarea[formcontrolname="notes"]', 'Lot 2291; tint 40 ml per litre');
      button(host, 'Save changes')?.click();
      const saved = http.expectOne({ method: 'PATCH', url: '/api/samples/b1' });
      expect(saved.request.body).toEqual({ notes: 'Lot 2291; tint 40 ml per litre' });
      saved.flush({ ...BOARD, status, notes: 'Lot 2291; tint 40 ml per litre' });
      await settle(fixture);
      expect(host.querySelector('.notes')?.textContent).toBe('Lot 2291; tint 40 ml per litre');
    },
  );

  it('the approved control sample offers nothing to edit, add or delete', async () => {
    const { host } = await render('approved');
    expect(hasPhotoControls(host)).toEqual({ add: false, delete: false });
    expect(buttons(host).filter((b) => /Edit/.test(b.textContent ?? ''))).toEqual([]);
  });

  it('crew may add photos to a board being made, but not edit or delete', async () => {
    const { host } = await render('draft', 'crew');
    expect(hasPhotoControls(host)).toEqual({ add: true, delete: false });
    expect(buttons(host).filter((b) => /Edit/.test(b.textContent ?? ''))).toEqual([]);
  });

  it("says what to fix when the client has no e-mail address to show the board to, with a link to the client's details", async () => {
    const { fixture, http, host } = await render('draft');
    button(host, 'Show to the client')?.click();
    await settle(fixture);
    const dialog = document.querySelector('mat-dialog-container');
    expect(dialog?.textContent).toContain('They will get an e-mail');
    button(dialog ?? document, 'Show to the client')?.click();
    (await sent(fixture, http, 'POST', '/api/samples/b1/show')).flush(
      {
        status: 400,
        title: 'The request has invalid fields',
        detail: 'The client has no e-mail address to tell them about the board.',
        errors: [{ field: 'client.email', message: "Add the client's e-mail address before showing them the board." }],
      },
      { status: 400, statusText: 'Bad Request', headers: { 'content-type': 'application/problem+json' } },
    );
    await settle(fixture);
    expect(host.textContent).toContain("Add the client's e-mail address before showing them the board.");
    const link = host.querySelector<HTMLAnchorElement>('a[href="/clients/c1"]');
    expect(link?.textContent?.trim()).toBe("Open Wren Halloway's details");
  });
});
