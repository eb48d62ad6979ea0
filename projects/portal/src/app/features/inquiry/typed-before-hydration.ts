import { DOCUMENT, isPlatformBrowser } from '@angular/common';
import { PLATFORM_ID, inject } from '@angular/core';

const UNTYPED = new Set(['checkbox', 'radio', 'submit', 'button', 'reset', 'file']);

/**
 * What the visitor has already typed or chosen in the server-rendered form, read before hydration.
 *
 * This form is not held disabled until hydration (its plain post is the no-script path), but
 * hydration writes each control's value into its field; reading the fields first and starting the
 * form model from them keeps every keystroke. Call from the component's constructor: that runs
 * before the template's form directives touch the fields. Null on the server, or when there is no
 * rendered form (the page was reached by navigation in the browser).
 *
 * Tick boxes are left out on purpose: event replay clicks them again after hydration, and each
 * replayed click toggles the box, so they must start from the state the server rendered.
 */
export function typedBeforeHydration(formId: string): Record<string, string> | null {
  if (!isPlatformBrowser(inject(PLATFORM_ID))) {
    return null;
  }
  const form = inject(DOCUMENT).getElementById(formId);
  if (!(form instanceof HTMLFormElement)) {
    return null;
  }
  const typed: Record<string, string> = {};
  for (const field of Array.from(form.elements)) {
    const isField = field instanceof HTMLInputElement || field instanceof HTMLTextAreaElement || field instanceof HTMLSelectElement;
    if (isField && field.name && !UNTYPED.has(field.type)) {
      typed[field.name] = field.value;
    }
  }
  return typed;
}
