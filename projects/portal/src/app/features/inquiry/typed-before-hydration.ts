import { DOCUMENT, isPlatformBrowser } from '@angular/common';
import { DestroyRef, PLATFORM_ID, inject } from '@angular/core';
import type { FormGroup } from '@angular/forms';

const UNTYPED = new Set(['checkbox', 'radio', 'submit', 'button', 'reset', 'file']);

type TypedField = HTMLInputElement | HTMLTextAreaElement | HTMLSelectElement;

/** A named field whose value is words typed or an option chosen (not a tick box or a button). */
function isTypedField(element: unknown): element is TypedField {
  const isField = element instanceof HTMLInputElement || element instanceof HTMLTextAreaElement || element instanceof HTMLSelectElement;
  return isField && element.name !== '' && !UNTYPED.has(element.type);
}

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
    if (isTypedField(field)) {
      typed[field.name] = field.value;
    }
  }
  return typed;
}

/**
 * From hydration on, copies what the visitor types or chooses in a field that is not awake yet (in
 * a part of the form still dehydrated, `@defer (hydrate …)`) into the form's model, so that when the
 * part wakes, its controls write the same value back. A field that is awake has already set the
 * value through its own listener, so nothing changes then. Tick boxes are left to event replay, as
 * in typedBeforeHydration. Call from the component's constructor.
 */
export function followTypingBeforeWaking(host: HTMLElement, form: FormGroup): void {
  if (!isPlatformBrowser(inject(PLATFORM_ID))) {
    return;
  }
  const follow = (event: Event) => {
    const field = event.target;
    if (!isTypedField(field) || (event instanceof InputEvent && event.isComposing)) {
      return;
    }
    const control = form.get(field.name);
    if (control && typeof control.value === 'string' && control.value !== field.value) {
      // The field already shows it: only the model learns it (nothing is written back mid-word).
      control.setValue(field.value, { emitModelToViewChange: false });
    }
  };
  host.addEventListener('input', follow);
  host.addEventListener('change', follow);
  inject(DestroyRef).onDestroy(() => {
    host.removeEventListener('input', follow);
    host.removeEventListener('change', follow);
  });
}
