import { expectInputError } from '../errors/expect-input-error';
import { marginFromMarkup, markupFromMargin } from './markup-margin';

describe('markup ⇄ margin (margin = markup / (1 + markup); common practice, DOMAIN.md §2.8 [D])', () => {
  it.each([
    ['0.25', '0.2'],
    ['0.5', '0.3333'],
    ['1', '0.5'],
  ])('markup %s is margin %s', (markup, margin) => {
    expect(marginFromMarkup(markup).toDecimalPlaces(4).toString()).toBe(margin);
  });

  it.each([
    ['0.2', '0.25'],
    ['0.3', '0.4286'],
    ['0.5', '1'],
  ])('margin %s is markup %s', (margin, markup) => {
    expect(markupFromMargin(margin).toDecimalPlaces(4).toString()).toBe(markup);
  });

  it('refuses a margin of 100 % and a negative markup', () => {
    expectInputError(() => markupFromMargin(1), 'margin', /below 100 %/);
    expectInputError(() => marginFromMarkup(-0.1), 'markup', /negative/);
  });
});
