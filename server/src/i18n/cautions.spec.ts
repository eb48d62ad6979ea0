import {
  CAUTION_WORDS,
  cautionText,
  leadNotice,
  OFFICE_ONLY_LINES,
  safetyCautions,
  type CautionWordKey,
  type SafetyFacts,
} from '@layerbook/domain';
import cautionsEn from '../../../projects/shared/i18n/words/cautions/en.json';
import cautionsEs from '../../../projects/shared/i18n/words/cautions/es.json';
import { cautionIn, leadNoticeIn } from './cautions';
import { translator, type Words } from './catalog';

/** The apps' file shape flattened back to the domain's keys: nested at the first dot ("lead-safe-work" → "title"). */
function flatten(words: Words, prefix = ''): Record<string, string> {
  return Object.fromEntries(
    Object.entries(words).flatMap(([k, v]) =>
      typeof v === 'string' ? [[`${prefix}${k}`, v]] : Object.entries(flatten(v, `${prefix}${k}.`)),
    ),
  );
}

const placeholders = (template: string) => [...template.matchAll(/\{\{(\w+)\}\}/g)].map((m) => m[1]).sort();

/** Facts that raise every caution the engine has: pre-1978 paint disturbed, a high working level, every hazard. */
const EVERYTHING: SafetyFacts = {
  lengthUnit: 'ft',
  yearBuilt: 1962,
  disturbedPaint: [
    { roomId: 'hall', isExterior: false, area: 40 },
    { roomId: 'front', isExterior: true, area: 30 },
  ],
  workingLevel: 14,
  products: [
    { name: 'Solvent wash', flashPointC: 12, boilingPointC: 82 },
    { name: 'Lime putty', isLime: true, containsSilica: true },
    { name: 'Raw linseed oil', containsDryingOil: true },
    { name: 'Marble dust plaster', containsSilica: true },
  ],
  sandsPlaster: true,
};

describe('caution words (projects/shared/i18n/words/cautions)', () => {
  it('the English file is exactly the domain’s words, key for key and word for word (lines, and the entries of a list)', () => {
    const en = flatten(cautionsEn);
    for (const key of Object.keys(CAUTION_WORDS)) expect(Object.keys(en)).toContain(key);
    // Each template rendered with its own placeholders gives itself back: cautionText knows the key and says exactly this.
    for (const [key, words] of Object.entries(en)) {
      const params = Object.fromEntries(placeholders(words).map((p) => [p, `{{${p}}}`]));
      expect([key, cautionText({ key: key as Parameters<typeof cautionText>[0]['key'], params })]).toEqual([key, words]);
    }
  });

  it('the Spanish file has every key, with the same placeholders, and no extra keys', () => {
    const en = flatten(cautionsEn);
    const es = flatten(cautionsEs);
    expect(Object.keys(es).sort()).toEqual(Object.keys(en).sort());
    for (const key of Object.keys(en)) {
      expect([key, placeholders(es[key])]).toEqual([key, placeholders(en[key])]);
      expect(es[key].trim()).not.toBe('');
    }
  });

  it('every key renders through the server catalog exactly as the domain writes it in English', () => {
    const t = translator('en');
    const params = { year: '1978', products: 'Lime putty, Marble dust plaster' };
    for (const key of Object.keys(CAUTION_WORDS) as CautionWordKey[]) {
      expect(t(`cautions.${key}`, params)).toBe(cautionText({ key, params }));
    }
    const flammable = safetyCautions(EVERYTHING).find((c) => c.id === 'flammable-liquid')!;
    expect(cautionIn('es', flammable).bullets[0]).toMatch(
      /^Inflamables: Solvent wash \(categoría \d(?: o \d)?, punto de inflamación 12 °C\)\.$/,
    );
  });

  it.each(['US', 'CA'])('every caution the engine raises (firm in %s) renders in English exactly as the engine wrote it', (firmCountry) => {
    const cautions = safetyCautions({ ...EVERYTHING, firmCountry });
    expect(cautions.map((c) => c.id).sort()).toEqual(
      [
        'edge-fall-protection',
        'flammable-liquid',
        'lead-safe-work',
        'lime-alkali',
        'oily-rags',
        'plaster-dust-silica',
        'scaffold-fall-protection',
      ].sort(),
    );
    for (const c of cautions) {
      expect(cautionIn('en', c)).toEqual({
        title: c.title,
        bullets: c.bullets,
        rule: c.rule,
        jurisdiction: c.jurisdiction,
        standing: c.standing,
      });
    }
  });

  it('a stored caution without keys (made before them, office lines taken out) is read back by its English bullets', () => {
    const c = safetyCautions(EVERYTHING).find((x) => x.id === 'scaffold-fall-protection')!;
    const stored = {
      title: c.title,
      bullets: c.bullets.filter((b) => !OFFICE_ONLY_LINES.has(b)),
      rule: c.rule,
      jurisdiction: c.jurisdiction,
      standing: c.standing,
    };
    expect(cautionIn('en', stored).bullets).toEqual(stored.bullets);
    const es = cautionIn('es', { ...stored, bullets: [...stored.bullets, 'A line the office typed.'], lines: c.lines });
    expect(es.bullets[0]).toMatch(/^Trabajar en un andamio a más de 10 ft/);
    expect(es.bullets[2]).toBe('A line the office typed.');
  });

  it('a snapshot caution (English only, with its id) reads in Spanish: title, rule, lines, jurisdiction and standing', () => {
    for (const c of safetyCautions({ ...EVERYTHING, firmCountry: 'CA' })) {
      const snapshot = { id: c.id, title: c.title, bullets: c.bullets, rule: c.rule, jurisdiction: c.jurisdiction, standing: c.standing };
      expect(cautionIn('es', snapshot)).toEqual(cautionIn('es', c));
      expect(cautionIn('en', snapshot)).toEqual(cautionIn('en', c));
    }
    expect(cautionIn('es', { title: 'Our own note', bullets: ['Mind the cat.'], rule: 'House rule' })).toEqual({
      title: 'Our own note',
      bullets: ['Mind the cat.'],
      rule: 'House rule',
      jurisdiction: '',
      standing: '',
    });
  });

  it('in Spanish every caution keeps all its lines, translated (none dropped, none left in English)', () => {
    for (const c of safetyCautions({ ...EVERYTHING, firmCountry: 'US' })) {
      const es = cautionIn('es', c);
      expect(es.bullets).toHaveLength(c.bullets.length);
      es.bullets.forEach((b, i) => expect(b).not.toBe(c.bullets[i]));
      expect(es.title).not.toBe(c.title);
      expect(es.standing).toBe(cautionsEs.standing);
      expect(Object.values(cautionsEs.jurisdiction)).toContain(es.jurisdiction);
    }
  });

  it.each(['target-housing', 'assumed-target-housing'] as const)(
    'the lead-safe notice (%s) reads the domain’s English exactly, and every sentence in Spanish',
    (status) => {
      const n = leadNotice(status, 'US')!;
      expect(leadNoticeIn('en', n)).toEqual({ ...n, bullets: [...n.bullets], standing: '' });
      const es = leadNoticeIn('es', n);
      expect(es.title).not.toBe(n.title);
      expect(es.rule).not.toBe(n.rule);
      es.bullets.forEach((b, i) => expect(b).not.toBe(n.bullets[i]));
      expect(es.jurisdiction).toBe(cautionsEs.jurisdiction.usFederal);
    },
  );
});
