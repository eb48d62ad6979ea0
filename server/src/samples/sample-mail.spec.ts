import { boardDecisionMail, boardShownMail } from './sample-mail';

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

describe("sample board answer e-mail to the firm's office", () => {
  const answer = {
    clientName: 'Marta Ríos',
    label: 'Hall, warm limewash',
    round: 2,
    comment: 'Más cálido',
    url: 'http://localhost:4300/samples/x',
  };

  it('is in English by default, as before', () => {
    const mail = boardDecisionMail({ ...answer, decision: 'approved' });
    expect(mail.subject).toBe('Marta Ríos approved the sample board "Hall, warm limewash" (round 2)');
    expect(mail.text).toContain('It is now the control sample for the work.');
  });

  it('is in Spanish for an office member who reads Spanish, with the client’s comment', () => {
    const mail = boardDecisionMail({ ...answer, decision: 'changes_requested', language: 'es' });
    expect(mail.subject).toBe('Marta Ríos pidió cambios en el tablero de muestra «Hall, warm limewash» (ronda 2)');
    expect(mail.text).toContain('Más cálido');
    expect(mail.text).toContain('Empiece la siguiente ronda desde el tablero cuando esté listo.');
  });
});
