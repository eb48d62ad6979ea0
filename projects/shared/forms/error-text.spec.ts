import { FormControl, Validators } from '@angular/forms';
import { errorText } from './error-text';

describe('errorText', () => {
  const words = { required: 'Enter a value.', min: 'At least {min}.', max: 'At most {max}.' };

  it('names the bound a number field failed', () => {
    expect(errorText(new FormControl(-3, [Validators.min(1)]), words)).toBe('At least 1.');
    expect(errorText(new FormControl(120, [Validators.max(100)]), words)).toBe('At most 100.');
  });

  it('keeps words without a placeholder, and the server message first', () => {
    expect(errorText(new FormControl('', [Validators.required]), words)).toBe('Enter a value.');
    const control = new FormControl('x');
    control.setErrors({ server: 'Crew size must be a whole number.', min: { min: 1, actual: 0 } });
    expect(errorText(control, words)).toBe('Crew size must be a whole number.');
  });

  it('falls back for a failure it has no words for', () => {
    expect(errorText(new FormControl('', [Validators.required]), {})).toBe('Check this field.');
  });
});
