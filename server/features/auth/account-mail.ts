import type { OutgoingMail } from '../../adapters/mail/mailer';
import { lotMail } from '../../adapters/mail/lot-mail';

/** The e-mail with the link that confirms a new (or changed) address. */
export function confirmAddressMail(to: { email: string; name: string }, link: string, validUntil: Date): OutgoingMail {
  return lotMail({
    to: to.email,
    subject: 'Confirm your e-mail address for Baleproof',
    greeting: `Hello ${to.name},`,
    lead: [
      'Open the link below to confirm that this address is yours.',
      'Until you do, Baleproof sends no saved-search alerts to it. E-mails about your own orders still come.',
    ],
    lot: { title: 'Your account', facts: [['E-mail', to.email], ['Link valid until', `${validUntil.toISOString().slice(0, 16).replace('T', ' ')} UTC`]] },
    action: { label: 'Confirm my address', url: link },
    footer: 'You get this e-mail because someone created a Baleproof account with this address. If it was not you, ignore it: without the link the address stays unconfirmed.',
  });
}

/** To the owner of an address someone tried to sign up with again: no account is created, nothing changes. */
export function addressTakenMail(to: { email: string; name: string }, publicUrl: string): OutgoingMail {
  return lotMail({
    to: to.email,
    subject: 'Someone tried to create a Baleproof account with your address',
    greeting: `Hello ${to.name},`,
    lead: [
      'Someone just tried to create a new Baleproof account with this e-mail address. You already have an account, so nothing was created and nothing changed.',
      'If it was you, sign in instead. If you forgot your password, write to Baleproof support from this address. If it was not you, you need do nothing.',
    ],
    lot: { title: 'Your account', facts: [['E-mail', to.email]] },
    action: { label: 'Sign in', url: `${publicUrl}/sign-in` },
    footer: 'You get this e-mail because this address has a Baleproof account.',
  });
}
