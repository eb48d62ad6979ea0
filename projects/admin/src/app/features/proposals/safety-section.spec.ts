import { TestBed } from '@angular/core/testing';
import { beforeEach, describe, expect, it } from 'vitest';
import { provideTestI18n } from '../../../../../shared/i18n/testing';
import proposals from '../../../i18n/proposals/en.json';
import { SafetySection } from './safety-section';

const scaffold = {
  id: 'scaffold-fall-protection',
  title: 'Scaffold fall protection',
  bullets: ['Work on a scaffold more than 10 ft above a lower level needs guardrails.'],
  rule: '29 CFR 1926.451(g)(1)',
  jurisdiction: 'A US federal rule. Outside the US, check your national or provincial rules.',
  standing: 'Follow local codes.',
};

function render(equipment: Array<{ label: string; amount: string }>): string {
  const fixture = TestBed.createComponent(SafetySection);
  fixture.componentRef.setInput('result', { cautions: [scaffold] });
  fixture.componentRef.setInput('equipment', equipment);
  fixture.detectChanges();
  return (fixture.nativeElement as HTMLElement).textContent ?? '';
}

describe('the builder safety section', () => {
  beforeEach(() => TestBed.configureTestingModule({ providers: [provideTestI18n({ proposals })] }));

  it('warns when the scaffold caution is raised and no equipment is priced (29 CFR 1926.451(g)(1))', () => {
    expect(render([])).toContain('no equipment is priced: add the scaffold rental');
    expect(render([{ label: 'Scaffold tower, 2 weeks', amount: '420.00' }])).not.toContain('no equipment is priced');
    expect(render([{ label: 'Scaffold tower', amount: 'typing' }])).not.toContain('no equipment is priced');
  });

  it("shows whose rule each caution cites and, outside the US, to check the firm's own rules", () => {
    expect(render([])).toContain('A US federal rule. Outside the US, check your national or provincial rules.');
  });
});
