import type { ComponentFixture } from '@angular/core/testing';

/**
 * A rendered form driven by its labels, as a person would: find a field by its mat-label, type into
 * it, submit the form, and read the error shown beside a field.
 */
export function formByLabels<T>(fixture: ComponentFixture<T>) {
  const html = fixture.nativeElement as HTMLElement;
  const field = (label: string): HTMLInputElement | HTMLTextAreaElement => {
    const formField = [...html.querySelectorAll('mat-form-field')].find((f) => f.querySelector('mat-label')?.textContent?.trim() === label);
    return formField!.querySelector<HTMLInputElement | HTMLTextAreaElement>('input, textarea')!;
  };
  const type = (label: string, value: string): void => {
    const input = field(label);
    input.value = value;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  const submit = async (): Promise<void> => {
    html.querySelector('form')!.dispatchEvent(new Event('submit'));
    fixture.detectChanges();
    await fixture.whenStable();
  };
  const errorOf = (label: string): string => field(label).closest('mat-form-field')?.querySelector('mat-error')?.textContent?.trim() ?? '';
  return { html, field, type, submit, errorOf };
}
