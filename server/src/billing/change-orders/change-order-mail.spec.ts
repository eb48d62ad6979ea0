import { changeOrderAnsweredMail, changeOrderSentMail } from './change-order-mail';

const facts = {
  firmName: 'Casa Cal Estucos',
  clientName: 'Marta Ríos',
  jobTitle: 'Stair hall limewash',
  number: 3,
  title: 'Add the landing ceiling',
  amount: '$450.00',
  url: 'http://localhost:4300/portal/change-orders/x',
  linkDays: 14,
  portalUrl: 'http://localhost:4300/portal/sign-in',
};

describe('change order e-mail to the client', () => {
  it('is in English by default, as before', () => {
    const mail = changeOrderSentMail(facts);
    expect(mail.subject).toBe('Casa Cal Estucos sent you change order #3: Add the landing ceiling');
    expect(mail.text).toContain('It changes the contract sum by $450.00.');
  });

  it("is in the client's language when they read Spanish, the firm's own words (title, job) as typed", () => {
    const mail = changeOrderSentMail({ ...facts, language: 'es' });
    expect(mail.subject).toBe('Casa Cal Estucos le envió la orden de cambio n.º 3: Add the landing ceiling');
    expect(mail.text).toContain('Hola, Marta Ríos:');
    expect(mail.text).toContain('Cambia el monto del contrato en $450.00.');
    expect(mail.html).toContain('lang="es"');
  });
});

describe("change order answer e-mail to the firm's office", () => {
  const answer = {
    firmName: 'Casa Cal Estucos',
    clientName: 'Marta Ríos',
    jobTitle: 'Stair hall limewash',
    number: 3,
    title: 'Add the landing ceiling',
    isApproved: true,
    signedName: 'Marta Ríos',
    amount: '$450.00',
    comment: 'Gracias',
    url: 'http://localhost:4300/jobs/x',
  };

  it('is in English by default, as before', () => {
    const mail = changeOrderAnsweredMail(answer);
    expect(mail.subject).toBe('Marta Ríos approved change order #3: Add the landing ceiling');
    expect(mail.text).toContain('The contract sum moved by $450.00 and the unbilled payments were spread again.');
    expect(mail.text).toContain('Their comment: "Gracias"');
  });

  it('is in Spanish for an office member who reads Spanish; a decline says nothing changed', () => {
    const approved = changeOrderAnsweredMail({ ...answer, language: 'es', amount: '450,00 US$' });
    expect(approved.subject).toBe('Marta Ríos aprobó la orden de cambio n.º 3: Add the landing ceiling');
    expect(approved.text).toContain('El monto del contrato cambió en 450,00 US$');
    expect(approved.html).toContain('lang="es"');
    const declined = changeOrderAnsweredMail({ ...answer, isApproved: false, signedName: null, comment: '', language: 'es' });
    expect(declined.subject).toBe('Marta Ríos rechazó la orden de cambio n.º 3: Add the landing ceiling');
    expect(declined.text).toContain('Nada de la obra cambió.');
    expect(declined.text).not.toContain('Su comentario');
  });
});
