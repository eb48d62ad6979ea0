import { logoPickProblem } from './logo-pick';

describe('logoPickProblem', () => {
  const MB = 1024 * 1024;
  it.each([
    [{ name: 'logo.png', size: 20_000, type: 'image/png' }, null],
    [{ name: 'logo.webp', size: 20_000, type: 'image/webp' }, null],
    [{ name: 'logo.jpg', size: 20_000, type: '' }, null],
    [{ name: 'logo.svg', size: 2_000, type: 'image/svg+xml' }, 'logo.svg is not a JPEG, PNG or WebP image. Choose one of those.'],
    [{ name: 'scan.pdf', size: 2_000, type: 'application/pdf' }, 'scan.pdf is not a JPEG, PNG or WebP image. Choose one of those.'],
    [{ name: 'big.png', size: 16 * MB, type: 'image/png' }, 'big.png is larger than 15 MB. Choose a smaller image.'],
  ])('%o → %s', (file, expected) => {
    expect(logoPickProblem(file, 15 * MB)).toBe(expected);
  });
});
