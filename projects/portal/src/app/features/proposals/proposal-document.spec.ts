import { TestBed } from '@angular/core/testing';
import { CAUTION_WORDS } from '@layerbook/domain';
import type { ProposalSnapshot } from '@layerbook/contracts/types';
import { describe, expect, it } from 'vitest';
import cautionsEn from '../../../../../shared/i18n/words/cautions/en.json';
import cautionsEs from '../../../../../shared/i18n/words/cautions/es.json';
import { Language } from '../../../../../shared/i18n/language';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposalsEn from '../../../i18n/proposals/en.json';
import proposalsEs from '../../../i18n/proposals/es.json';
import { ProposalDocument } from './proposal-document';
import { SNAPSHOT } from './proposal-fixtures';

const lime = {
  id: 'lime-alkali',
  title: CAUTION_WORDS['lime-alkali.title'],
  bullets: ['Lime products: Calce Fina.', CAUTION_WORDS['lime-alkali.protect'], CAUTION_WORDS['lime-alkali.eyewash']],
  rule: CAUTION_WORDS['lime-alkali.rule'],
  jurisdiction: `${CAUTION_WORDS['jurisdiction.guidance']} ${CAUTION_WORDS['jurisdiction.outsideUs']}`,
  standing: CAUTION_WORDS.standing,
};

const snapshot = {
  ...SNAPSHOT,
  options: [
    {
      id: 'o1',
      label: 'Lime plaster',
      price: '9000.00',
      tax: '742.50',
      total: '9742.50',
      schedule: { startDate: '2026-04-06', finishDate: '2026-04-10', workingDays: 5, milestones: [] },
      payments: [],
      isDepositCapped: false,
    },
  ],
  terms: { depositPercent: 30, progressPercent: 0, text: '' },
  safety: { standing: CAUTION_WORDS.standing, cautions: [lime] },
} satisfies ProposalSnapshot;

async function render(language: 'en' | 'es', shown: ProposalSnapshot = snapshot) {
  const words = language === 'es' ? { proposals: proposalsEs, cautions: cautionsEs } : { proposals: proposalsEn, cautions: cautionsEn };
  TestBed.configureTestingModule({ providers: [provideTestI18n(words, language)] });
  await TestBed.inject(Language).use(language);
  const fixture = TestBed.createComponent(ProposalDocument);
  fixture.componentRef.setInput('snapshot', shown);
  await fixture.whenStable();
  return fixture.nativeElement as HTMLElement;
}

const texts = (html: HTMLElement, selector: string) => [...html.querySelectorAll(selector)].map((e) => e.textContent?.trim());

describe('the proposal document', () => {
  it('in English shows the engine’s caution words exactly, money and days in en-US', async () => {
    const html = await render('en');
    const safety = html.querySelector('[aria-labelledby="safety-heading"]') as HTMLElement;
    expect(safety.querySelector('h3')?.textContent).toBe('Lime is caustic');
    expect(texts(safety, 'li')).toEqual(lime.bullets);
    expect(texts(safety, '.rule')).toEqual([lime.rule, lime.jurisdiction]);
    expect(safety.querySelector('.standing')?.textContent).toBe(CAUTION_WORDS.standing);
    expect(html.querySelector('.total')?.textContent).toBe('$9,742.50');
    expect(html.textContent).toContain(
      'A deposit of 30 % on acceptance and the rest on completion, as in the payment schedule of each option.',
    );
    expect(html.textContent).toContain('March 2, 2026');
  });

  it('in Spanish keeps every caution line (none dropped), by its key, with the product names as sent', async () => {
    const html = await render('es');
    const safety = html.querySelector('[aria-labelledby="safety-heading"]') as HTMLElement;
    expect(safety.querySelector('h2')?.textContent).toBe('Seguridad y cumplimiento');
    expect(safety.querySelector('h3')?.textContent).toBe(cautionsEs['lime-alkali'].title);
    const bullets = texts(safety, 'li');
    expect(bullets).toHaveLength(lime.bullets.length);
    expect(bullets[0]).toBe(cautionsEs['lime-alkali'].products.replace('{{products}}', 'Calce Fina'));
    expect(bullets.slice(1)).toEqual([cautionsEs['lime-alkali'].protect, cautionsEs['lime-alkali'].eyewash]);
    expect(texts(safety, '.rule')).toEqual([
      cautionsEs['lime-alkali'].rule,
      `${cautionsEs.jurisdiction.guidance} ${cautionsEs.jurisdiction.outsideUs}`,
    ]);
    expect(safety.querySelector('.standing')?.textContent).toBe(cautionsEs.standing);
    // CLDR es: "14 de marzo de 2026"; US Spanish keeps the US money pattern
    expect(html.textContent).toContain('2 de marzo de 2026');
    expect(html.querySelector('.total')?.textContent).toBe('$9,742.50');
    expect(html.textContent).toContain(
      'Un anticipo del 30 % al aceptar y el resto al terminar, según el calendario de pagos de cada opción.',
    );
  });

  it('says under an option’s payments when its deposit was limited by the law, as the PDF does', async () => {
    expect((await render('en')).querySelector('.capped')).toBeNull();
    TestBed.resetTestingModule();
    const capped = { ...snapshot, options: [{ ...snapshot.options[0], isDepositCapped: true }] };
    expect((await render('es', capped)).querySelector('.capped')?.textContent?.trim()).toBe(
      'El anticipo se limita al importe que permite la ley aquí; el resto pasa al pago final.',
    );
  });
});
