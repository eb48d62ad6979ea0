import { describe, expect, it } from 'vitest';
import { leadNotice } from '@layerbook/domain';
import es from '../../../i18n/proposals/es.json';
import { cautionFootnotes, cautionView, leadNoticeView } from './caution-words';

describe('cautionFootnotes', () => {
  it.each([
    [
      'a caution of a firm outside the US',
      { rule: '40 CFR 745 subpart E', jurisdiction: 'A US federal rule. Outside the US, check your national or provincial rules.' },
      ['40 CFR 745 subpart E', 'A US federal rule. Outside the US, check your national or provincial rules.'],
    ],
    ['guidance', { rule: 'ICSC 0408', jurisdiction: 'Guidance, not a regulation.' }, ['ICSC 0408', 'Guidance, not a regulation.']],
    ['a snapshot from before the jurisdiction line', { rule: '29 CFR 1926.451(g)(1)' }, ['29 CFR 1926.451(g)(1)']],
    ['nothing to say', { rule: ' ', jurisdiction: '' }, []],
  ])('%s', (_case, caution, lines) => {
    expect(cautionFootnotes(caution)).toEqual(lines);
  });
});

describe('cautionView', () => {
  const spanish: Record<string, string> = {
    'lime-alkali.title': 'La cal es cáustica',
    'lime-alkali.products': 'Productos de cal: {{products}}.',
    'jurisdiction.guidance': 'Orientación, no un reglamento.',
    'flammable-liquid.products': 'Inflamables: {{products}}.',
    'flammable-liquid.product': '{{name}} (categoría {{category}}, punto de inflamación {{flashPoint}} °C)',
  };
  const say = (key: string, params: Readonly<Record<string, string>> = {}) =>
    spanish[key]?.replace(/\{\{(\w+)\}\}/g, (_, name: string) => params[name] ?? '') ?? null;

  it('translates by key and keeps the English where the words have no key', () => {
    const view = cautionView(
      'lime-alkali',
      {
        title: 'Lime is caustic',
        bullets: ['Lime products: Estuco A, Estuco B.', 'A line the engine never wrote.'],
        rule: 'ICSC 0408 (calcium hydroxide)',
        jurisdiction: 'Guidance, not a regulation.',
      },
      say,
    );
    expect(view.title).toBe('La cal es cáustica');
    expect(view.bullets).toEqual(['Productos de cal: Estuco A, Estuco B.', 'A line the engine never wrote.']);
    expect(view.footnotes).toEqual(['ICSC 0408 (calcium hydroxide)', 'Orientación, no un reglamento.']);
  });

  it('says each flammable product in the reader’s words and joins them as the English does', () => {
    const view = cautionView(
      'flammable-liquid',
      {
        title: 'Flammable liquids in the mix',
        bullets: ['Flammable: Oil glaze (category 3, flash point 40 °C), Thinner, odourless (category 2, flash point 12 °C).'],
        rule: '',
      },
      say,
    );
    expect(view.bullets).toEqual([
      'Inflamables: Oil glaze (categoría 3, punto de inflamación 40 °C), Thinner, odourless (categoría 2, punto de inflamación 12 °C).',
    ]);
  });
});

describe('leadNoticeView', () => {
  const words: Record<string, string> = es.leadNotice;
  const sayLead = (key: string) => words[key] ?? null;
  const say = (key: string) => (key === 'jurisdiction.usFederal' ? 'Una norma federal de EE. UU.' : null);

  it('says every line of the notice the engine writes in Spanish, for a known and an unknown year', () => {
    for (const status of ['target-housing', 'assumed-target-housing'] as const) {
      const notice = leadNotice(status);
      if (!notice) throw new Error('a pre-1978 home has a notice');
      const view = leadNoticeView(notice, say, sayLead);
      expect(view.title).toBe(words['title']);
      expect(view.bullets).toEqual([
        status === 'target-housing' ? words['targetHousing'] : words['unknownYear'],
        words['certifiedFirm'],
        words['pamphlet'],
        words['stricter'],
      ]);
      expect(view.footnotes).toEqual([words['rule'], 'Una norma federal de EE. UU.']);
    }
  });

  it('keeps a line it has no words for in the English the snapshot holds', () => {
    const notice = { title: 'Lead notice', bullets: ['A line of our own.'], rule: '40 CFR 745', jurisdiction: '' };
    expect(leadNoticeView(notice, say, sayLead)).toEqual({
      title: 'Lead notice',
      bullets: ['A line of our own.'],
      footnotes: ['40 CFR 745'],
    });
  });
});
