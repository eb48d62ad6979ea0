import { siteLine } from './site-line';

// Our own wording (common practice, no source): the parts the office recognises a site by.
describe('a site on one line', () => {
  it.each([
    [{ label: 'Main house', addressLine1: '14 Kiln Row', city: 'Ashford Vale' }, 'Main house, 14 Kiln Row, Ashford Vale'],
    [{ label: '', addressLine1: '14 Kiln Row', city: 'Ashford Vale' }, '14 Kiln Row, Ashford Vale'],
    [{ label: 'Barn', addressLine1: ' ', city: '' }, 'Barn'],
    [{ label: '', addressLine1: '', city: '' }, ''],
  ])('%j → %s', (site, expected) => {
    expect(siteLine(site)).toBe(expected);
  });
});
