import { changeOrderSentMail } from './change-order-mail';

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
