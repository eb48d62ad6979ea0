import { firmDateTime } from './firm-time';
import { fromHeader, sendingAddress } from './send-mail-job';

describe('times in e-mails', () => {
  // 2026-12-02 02:15 UTC is 9:15 PM on December 1 in New York (EST, UTC−5 in winter: IANA tz database).
  const at = new Date('2026-12-02T02:15:00Z');

  it.each([
    ['America/New_York', 'December 1, 2026 at 9:15 PM EST'],
    ['America/Los_Angeles', 'December 1, 2026 at 6:15 PM PST'],
    ['Europe/London', 'December 2, 2026 at 2:15 AM GMT'],
  ])('shows the moment in the firm’s zone %s', (zone, shown) => {
    expect(firmDateTime(at, 'en-US', zone).replace(/\u202f/g, ' ')).toBe(shown);
  });

  it('never says UTC for a New York firm', () => {
    expect(firmDateTime(at, 'en-US', 'America/New_York')).not.toContain('UTC');
  });
});

describe('sender of an e-mail', () => {
  it('keeps our sending address and puts the firm’s name in front of it', () => {
    expect(sendingAddress('Layerbook <no-reply@layerbook.local>')).toBe('no-reply@layerbook.local');
    expect(sendingAddress('mail@layerbook.local')).toBe('mail@layerbook.local');
    expect(fromHeader('Layerbook <no-reply@layerbook.local>', 'Fernhollow Plaster & Glaze')).toEqual({
      name: 'Fernhollow Plaster & Glaze',
      address: 'no-reply@layerbook.local',
    });
    expect(fromHeader('Layerbook <no-reply@layerbook.local>', null)).toBe('Layerbook <no-reply@layerbook.local>');
  });
});
