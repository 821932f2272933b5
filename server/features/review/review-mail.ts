import type { OutgoingMail } from '../../adapters/mail/mailer';

/** The e-mails a grower gets from the review desk. */
export function approvedMail(to: string, lot: { id: number; title: string }, publicUrl: string): OutgoingMail {
  const url = `${publicUrl}/hay/${lot.id}`;
  return {
    to,
    subject: `Listed: ${lot.title}`,
    text: `Good news: we checked the lab report of “${lot.title}” against the values you entered, and the lot is now listed for buyers.\n\nSee it as buyers do: ${url}\nManage your lots: ${publicUrl}/selling\n\n— Baleproof`,
  };
}

export function returnedMail(to: string, lot: { id: number; title: string }, reason: string, publicUrl: string): OutgoingMail {
  return {
    to,
    subject: `Needs a change: ${lot.title}`,
    text: `We could not list “${lot.title}” yet. The reviewer wrote:\n\n${reason}\n\nOpen the lot, make the change and submit it again: ${publicUrl}/selling/lots/${lot.id}\n\n— Baleproof`,
  };
}
