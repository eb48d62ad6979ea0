import { render, type RenderedMail } from './templates';

/** To a new address: the link that finishes opening the firm. */
export function signUpConfirmMail(p: { name: string; firmName: string; url: string; hours: number }): RenderedMail {
  return render(
    `Finish opening ${p.firmName} on Layerbook`,
    'Confirm your e-mail',
    [
      `Hello ${p.name}, someone (we hope you) asked to open ${p.firmName} on Layerbook with this address.`,
      `Follow the link to confirm it and open the firm. It is good for ${p.hours} hours and works once.`,
    ],
    { label: 'Open my firm', url: p.url },
    'If you did not ask for this, ignore this e-mail: nothing is created until the link is followed.',
  );
}

/** To an address that already has an account: nothing was created, and what to do if it was them. */
export function signUpKnownAddressMail(p: { name: string; signInUrl: string; resetUrl: string }): RenderedMail {
  return render(
    'Someone tried to open a Layerbook firm with your address',
    'You already have an account',
    [
      `Hello ${p.name}, someone tried to open a new Layerbook firm with your e-mail address. No new account was created.`,
      `If it was you, sign in instead, or reset your password if you have forgotten it: ${p.resetUrl}`,
    ],
    { label: 'Sign in', url: p.signInUrl },
    'If it was not you, you can ignore this e-mail; your account is unchanged.',
  );
}
