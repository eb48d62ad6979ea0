import { ASK_FOR_YEAR, isTreatedAsTargetHousing, leadNotice, leadRuleYear, leadStatus } from './lead-status';

describe('lead status of a home (40 CFR 745; target housing is built before 1978, 15 U.S.C. 2681(17))', () => {
  it.each([
    [1977, false, 'target-housing', 1977], // 15 U.S.C. 2681(17): "constructed prior to 1978"
    [1977, true, 'target-housing', 1977],
    [1978, true, 'built-1978-or-later', 1978], // 15 U.S.C. 2681(17): 1978 is not "prior to 1978"
    [1990, true, 'built-1978-or-later', 1990],
    [null, true, 'assumed-target-housing', 1977], // common practice, no source: unknown counts as before 1978 until told
    [undefined, true, 'assumed-target-housing', 1977],
    [null, false, 'year-unknown', undefined], // nothing painted is disturbed: no lead rule to apply
  ] as const)('built %s, paint disturbed %s: %s (the rule works with year %s)', (year, disturbs, status, ruleYear) => {
    expect(leadStatus(year, disturbs)).toBe(status);
    expect(leadRuleYear(year, disturbs)).toBe(ruleYear);
  });

  it.each([
    ['target-housing' as const, true, 'This home was built before 1978'],
    ['assumed-target-housing' as const, true, 'please tell us the year'],
    ['year-unknown' as const, false, null],
    ['built-1978-or-later' as const, false, null],
  ])('%s: treated as target housing %s, notice says %s', (status, isTarget, says) => {
    expect(isTreatedAsTargetHousing(status)).toBe(isTarget);
    const notice = leadNotice(status);
    if (says === null) return expect(notice).toBeNull();
    expect(notice?.bullets[0]).toContain(says);
    // 40 CFR 745.83 minor-repair limits and 745.84 pre-renovation pamphlet
    expect(notice?.bullets.join(' ')).toContain('more than 6 ft² in a room or 20 ft² outside');
    expect(notice?.bullets.join(' ')).toContain('Renovate Right');
    expect(notice?.rule).toContain('40 CFR 745');
  });

  it.each([
    [undefined, 'A US federal rule.'],
    ['US', 'A US federal rule.'],
    // 40 CFR 745 is a US federal rule (EPA); elsewhere the firm checks its own rules
    ['CA', 'A US federal rule. Outside the US, check your national or provincial rules.'],
  ])('says whose rule it is for a firm in %s: "%s"', (country, line) => {
    expect(leadNotice('target-housing', country)?.jurisdiction).toBe(line);
  });

  it('asks for the year in words the office can act on', () => {
    expect(ASK_FOR_YEAR).toMatch(/enter the year on the site/);
  });
});
