import { unpricedScaffoldWarning } from './scaffold-pricing';

const SCAFFOLD = [{ id: 'edge-fall-protection' }, { id: 'scaffold-fall-protection' }];

describe('the builder warns when a scaffold is needed and no equipment is priced', () => {
  it.each([
    // 29 CFR 1926.451(g)(1): the scaffold caution is raised above 10 ft
    [SCAFFOLD, undefined, true],
    [SCAFFOLD, [], true],
    [SCAFFOLD, [{ amount: '0' }], true],
    [SCAFFOLD, [{ amount: '0.00' }, { amount: '350.00' }], false],
    [[{ id: 'edge-fall-protection' }], [], false],
    [[], undefined, false],
  ])('cautions %j, equipment %j', (cautions, equipment, warns) => {
    expect(unpricedScaffoldWarning(cautions, equipment) !== null).toBe(warns);
  });

  it('says what is missing', () => {
    expect(unpricedScaffoldWarning(SCAFFOLD, [])).toMatch(/no equipment is priced: add the scaffold rental/);
  });
});
