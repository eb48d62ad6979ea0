import { boardShownMail } from './sample-mail';

const facts = {
  firmName: 'Casa Cal Estucos',
  name: 'Marta Ríos',
  label: 'Hall, warm limewash',
  round: 2,
  url: 'http://localhost:4300/portal/sign-in/link?token=t&next=/portal/boards/x',
  linkDays: 3,
  portalUrl: 'http://localhost:4300/portal/sign-in',
};

describe('sample board e-mail to the client', () => {
  it('is in English by default, as before', () => {
    const mail = boardShownMail(facts);
    expect(mail.subject).toBe('Casa Cal Estucos has a sample board for you to look at');
    expect(mail.text).toContain('"Hall, warm limewash" (round 2)');
    expect(mail.text).toContain('The button signs you in once, within 3 days.');
    expect(mail.text).toContain('Ask for a new one at http://localhost:4300/portal/sign-in.');
  });

  it("is in the client's language when they read Spanish, the board's own name as typed", () => {
    const mail = boardShownMail({ ...facts, language: 'es' });
    expect(mail.subject).toBe('Casa Cal Estucos tiene un tablero de muestra para que lo vea');
    expect(mail.text).toContain('«Hall, warm limewash» (ronda 2)');
    expect(mail.html).toContain('lang="es"');
  });
});
