import { provideZonelessChangeDetection, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { Router, provideRouter } from '@angular/router';
import type { StaffSession } from '@layerbook/contracts/types';
import { describe, expect, it, vi } from 'vitest';
import common from '../../../../../shared/i18n/words/common/en.json';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import layout from '../../../i18n/layout/en.json';
import { staffSession } from '../../shared/testing/staff-session';
import { Session, type StaffUser } from '../auth/session';
import { Shell } from './shell';

async function render(user: StaffUser, answer: StaffSession) {
  const switchFirm = vi.fn().mockResolvedValue(answer);
  TestBed.configureTestingModule({
    providers: [
      provideZonelessChangeDetection(),
      provideRouter([]),
      provideTestI18n({ layout, common }),
      { provide: Session, useValue: { user: signal(user), hasRole: () => true, switchFirm } },
    ],
  });
  const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
  const fixture = TestBed.createComponent(Shell);
  fixture.detectChanges();
  await fixture.whenStable();
  const open = async (selector: string) => {
    document.querySelector<HTMLElement>(selector)!.click();
    fixture.detectChanges();
    await fixture.whenStable();
  };
  return { fixture, switchFirm, navigate, open };
}

const menuItems = () => Array.from(document.querySelectorAll<HTMLElement>('.mat-mdc-menu-panel [mat-menu-item]'));

describe('the firm switch in the person menu', () => {
  const me = staffSession('owner').user!;

  it('is not offered to someone in one firm', async () => {
    const { open } = await render(me, staffSession());
    await open('button.me');
    expect(document.querySelector('[data-testid="switch-firm"]')).toBeNull();
  });

  it('lists the other firms with the role there, and goes to the second-factor step when that firm asks for one', async () => {
    const other = { id: 'f2', name: 'Bellwether Glazing', role: 'office' as const };
    const asked: StaffSession = { user: null, csrfToken: 't2', secondFactor: { step: 'code', expiresAt: '2026-12-05T10:05:00Z' } };
    const { open, switchFirm, navigate } = await render({ ...me, otherFirms: [other] }, asked);
    await open('button.me');
    await open('[data-testid="switch-firm"]');
    const firm = menuItems().find((item) => item.textContent?.includes('Bellwether'))!;
    expect(firm.textContent?.trim()).toBe('Bellwether Glazing (office)');
    firm.click();
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(switchFirm).toHaveBeenCalledWith('f2');
    expect(navigate).toHaveBeenCalledWith('/sign-in/code');
  });
});
