import { PLATFORM_ID } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { afterEach, describe, expect, it } from 'vitest';
import { inquiryForm } from './inquiry-form-model';
import { followTypingBeforeWaking } from './typed-before-hydration';

/** A server-rendered field nobody's control is bound to yet (a part of the form still asleep). */
function pageWith(html: string): HTMLElement {
  const host = document.createElement('div');
  host.innerHTML = html;
  document.body.append(host);
  return host;
}

describe('followTypingBeforeWaking', () => {
  afterEach(() => (document.body.innerHTML = ''));

  function follow(host: HTMLElement, platform = 'browser') {
    TestBed.configureTestingModule({ providers: [{ provide: PLATFORM_ID, useValue: platform }] });
    const form = inquiryForm('stamp');
    TestBed.runInInjectionContext(() => followTypingBeforeWaking(host, form));
    return form;
  }

  it('puts what is typed or chosen in a field that is not awake into the model', () => {
    const host = pageWith(
      '<textarea name="rooms"></textarea><select name="budgetRange"><option value="">-</option><option value="5k-15k">x</option></select>',
    );
    const form = follow(host);
    const rooms = host.querySelector('textarea')!;
    rooms.value = 'Stair hall and landing';
    rooms.dispatchEvent(new InputEvent('input', { bubbles: true }));
    const budget = host.querySelector('select')!;
    budget.value = '5k-15k';
    budget.dispatchEvent(new Event('change', { bubbles: true }));
    expect(form.controls.rooms.value).toBe('Stair hall and landing');
    expect(form.controls.budgetRange.value).toBe('5k-15k');
  });

  it('leaves tick boxes to event replay, skips words still being composed and unnamed fields', () => {
    const host = pageWith('<input type="checkbox" name="consent" /><input name="timeline" /><input id="other" />');
    const form = follow(host);
    const box = host.querySelector<HTMLInputElement>('[name=consent]')!;
    box.checked = true;
    box.dispatchEvent(new Event('change', { bubbles: true }));
    const timeline = host.querySelector<HTMLInputElement>('[name=timeline]')!;
    timeline.value = 'spr';
    timeline.dispatchEvent(new InputEvent('input', { bubbles: true, isComposing: true }));
    host.querySelector<HTMLInputElement>('#other')!.dispatchEvent(new InputEvent('input', { bubbles: true }));
    expect(form.controls.consent.value).toBe(false);
    expect(form.controls.timeline.value).toBe('');
  });

  it('stops following when the page goes, and does nothing on the server', () => {
    const host = pageWith('<input name="timeline" />');
    const form = follow(host);
    TestBed.resetTestingModule(); // destroys the injector the page's DestroyRef came from
    const timeline = host.querySelector('input')!;
    timeline.value = 'spring';
    timeline.dispatchEvent(new InputEvent('input', { bubbles: true }));
    expect(form.controls.timeline.value).toBe('');

    const serverForm = follow(pageWith('<input name="phone" />'), 'server');
    const phone = document.querySelector<HTMLInputElement>('[name=phone]')!;
    phone.value = '555';
    phone.dispatchEvent(new InputEvent('input', { bubbles: true }));
    expect(serverForm.controls.phone.value).toBe('');
  });
});
