import { describe, expect, it } from 'vitest';
import proposals from '../../../i18n/proposals/en.json';
import es from '../../../i18n/proposals/es.json';
import { paymentTermsSentence, type TermsSay } from './terms-words';

/** The area's words by key with {{params}} filled, as the translate service does. */
function sayFrom(words: unknown): TermsSay {
  return (key, params = {}) => {
    const text = key.split('.').reduce<unknown>((at, part) => (at as Record<string, unknown>)[part], words) as string;
    return text.replace(/\{\{(\w+)\}\}/g, (_, name: string) => String(params[name]));
  };
}

describe('paymentTermsSentence', () => {
  it.each([
    [
      30,
      40,
      'A deposit of 30 % on acceptance, a progress payment of 40 % when the layer named in the payment schedule is finished on every surface, and the rest on completion, as in the payment schedule of each option.',
    ],
    [30, 0, 'A deposit of 30 % on acceptance and the rest on completion, as in the payment schedule of each option.'],
    [
      0,
      50,
      'A progress payment of 50 % when the layer named in the payment schedule is finished on every surface and the rest on completion, as in the payment schedule of each option.',
    ],
    [0, 0, 'Payment in full on completion, as in the payment schedule of each option.'],
  ])('deposit %d %, progress %d %: no stray comma, only the payments there are', (depositPercent, progressPercent, sentence) => {
    const text = paymentTermsSentence({ depositPercent, progressPercent }, sayFrom(proposals), 'en-US');
    expect(text).toBe(sentence);
    expect(text).not.toMatch(/\s,/);
  });

  it('joins the list the Spanish way (CLDR list patterns: "a, b y c")', () => {
    expect(paymentTermsSentence({ depositPercent: 30, progressPercent: 40 }, sayFrom(es), 'es-US')).toBe(
      'Un anticipo del 30 % al aceptar, un pago de avance del 40 % cuando la capa indicada en el calendario de pagos esté terminada en todas las superficies y el resto al terminar, según el calendario de pagos de cada opción.',
    );
  });
});
