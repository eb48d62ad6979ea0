import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { describe, expect, it, vi } from 'vitest';
import { focusAfterRender } from './focus-after-render';

/** A button that gives way to its result, as the portal's answers do. */
@Component({
  template: `
    @if (isDone()) {
      <p class="result" tabindex="-1">Done</p>
    } @else {
      <button type="button" (click)="finish()">Do it</button>
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
class Swap {
  private readonly focus = focusAfterRender();
  protected readonly isDone = signal(false);

  protected finish(): void {
    this.isDone.set(true);
    this.focus('.result');
  }
}

describe('focusAfterRender', () => {
  it('moves focus to the result once it is on screen, instead of leaving it on the page body', async () => {
    const fixture = TestBed.createComponent(Swap);
    const html = fixture.nativeElement as HTMLElement;
    document.body.appendChild(html);
    fixture.detectChanges();
    html.querySelector('button')!.click();
    await vi.waitFor(() => {
      fixture.detectChanges();
      expect(document.activeElement).toBe(html.querySelector('.result'));
    });
    html.remove();
  });
});
