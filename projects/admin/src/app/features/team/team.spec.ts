import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { ItemList, TeamInvitation, TeamMember } from '@layerbook/contracts/types';
import { of } from 'rxjs';
import { afterEach, describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import team from '../../../i18n/team/en.json';
import ui from '../../../i18n/ui/en.json';
import { Session } from '../../core/auth/session';
import { Team } from './team';

const member = (over: Partial<TeamMember>): TeamMember => ({
  id: 'm-1',
  userId: 'u-1',
  name: 'Olive Owner',
  email: 'olive@example.com',
  role: 'owner',
  status: 'active',
  language: null,
  isYou: false,
  hasSecondFactor: true,
  ...over,
});

const MEMBERS: ItemList<TeamMember> = {
  items: [
    member({ isYou: true }),
    member({ id: 'm-2', userId: 'u-2', name: 'Otto Office', email: 'otto@example.com', role: 'office' }),
    member({ id: 'm-3', userId: 'u-3', name: 'Cora Crew', email: 'cora@example.com', role: 'crew', hasSecondFactor: false }),
    member({ id: 'm-4', userId: 'u-4', name: 'Nell Nofactor', email: 'nell@example.com', role: 'office', hasSecondFactor: false }),
  ],
};

async function render(role: 'owner' | 'office', confirmed: boolean) {
  const open = vi.fn(() => ({ afterClosed: () => of(confirmed) }));
  TestBed.configureTestingModule({
    providers: [
      provideTestI18n({ team, ui, common }),
      provideZonelessChangeDetection(),
      provideHttpClient(),
      provideHttpClientTesting(),
      provideRouter([]),
      provideNoopAnimations(),
      { provide: MatDialog, useValue: { open } },
      { provide: Session, useValue: { isOwner: signal(role === 'owner') } },
    ],
  });
  const http = TestBed.inject(HttpTestingController);
  const fixture = TestBed.createComponent(Team);
  fixture.detectChanges();
  http.expectOne('/api/team/members').flush(MEMBERS);
  http.expectOne('/api/team/invitations').flush({ items: [] } satisfies ItemList<TeamInvitation>);
  await fixture.whenStable();
  fixture.detectChanges();
  const host = fixture.nativeElement as HTMLElement;
  const row = (name: string) => [...host.querySelectorAll('tbody tr')].find((tr) => tr.textContent?.includes(name))!;
  const clearButton = (name: string) =>
    [...row(name).querySelectorAll<HTMLButtonElement>('button')].find((b) => b.textContent?.includes('Clear second factor'));
  return { fixture, http, open, clearButton };
}

describe("Team: clearing a member's second factor", { timeout: 30_000 }, () => {
  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('offers the owner to clear it for other members who have one, never for themselves', async () => {
    const { clearButton } = await render('owner', false);
    expect(clearButton('Otto Office')).toBeDefined();
    expect(clearButton('Cora Crew')).toBeUndefined();
    expect(clearButton('Nell Nofactor')).toBeUndefined();
    expect(clearButton('Olive Owner')).toBeUndefined();
  });

  it('asks first, naming the member; nothing is sent when the owner says no', async () => {
    const { http, open, clearButton } = await render('owner', false);
    clearButton('Otto Office')!.click();
    await Promise.resolve();
    expect(open).toHaveBeenCalledWith(
      expect.anything(),
      expect.objectContaining({
        data: expect.objectContaining({
          title: 'team.team.clearFactorTitle',
          message: 'team.team.clearFactorMessage',
          confirmLabel: 'team.team.clearFactor',
          params: { name: 'Otto Office' },
        }),
      }),
    );
    http.expectNone({ method: 'POST' });
  });

  it('clears it once confirmed, then reads the team again', async () => {
    const { fixture, http, clearButton } = await render('owner', true);
    clearButton('Otto Office')!.click();
    await fixture.whenStable();
    const reset = http.expectOne({ method: 'POST', url: '/api/auth/second-factor/members/m-2/reset' });
    expect(reset.request.body).toEqual({});
    reset.flush(null, { status: 204, statusText: 'No Content' });
    // The reload is asked for once the answer is in (a pending read keeps the fixture from settling).
    await new Promise((resolve) => setTimeout(resolve, 0));
    TestBed.tick();
    expect(document.body.textContent).toContain("Otto Office's second factor is cleared.");
    http.expectOne('/api/team/members').flush(MEMBERS);
    http.expectOne('/api/team/invitations').flush({ items: [] });
  });

  it('is not offered to office members, who only read the team', async () => {
    const { clearButton } = await render('office', true);
    expect(clearButton('Otto Office')).toBeUndefined();
  });
});
