import { renderEmail } from '../emails/email-layout';
import type { MailMessage } from '../emails/mailer';

/** What the grower's invoice e-mail says. */
export interface InvoiceEmailFacts {
  operationName: string;
  growerName: string;
  number: number;
  kind: string;
  crop: string;
  season: number;
  amountCents: number;
  issuedOn: string;
  dueOn: string;
}

const money = (cents: number) =>
  `$${(cents / 100).toLocaleString('en-US', { minimumFractionDigits: 2, maximumFractionDigits: 2 })}`;

/** To a grower: a new invoice, with a link to view and pay it in the orchard portal. */
export function invoiceEmail(to: string, f: InvoiceEmailFacts, invoiceUrl: string): MailMessage {
  return {
    to,
    subject: `Invoice ${f.number} from ${f.operationName}: ${money(f.amountCents)} due ${f.dueOn}`,
    ...renderEmail({
      greeting: `Hello ${f.growerName},`,
      paragraphs: [
        `${f.operationName} has sent you invoice ${f.number}, the ${f.kind} for ${f.crop} pollination in ${f.season}.`,
      ],
      facts: [
        ['Invoice', String(f.number)],
        ['Amount', money(f.amountCents)],
        ['Issued', f.issuedOn],
        ['Due', f.dueOn],
      ],
      actions: [
        {
          label: 'View and pay the invoice',
          url: invoiceUrl,
          hint: 'Sign in to your orchard portal; card payment goes through our payment provider’s secure page.',
        },
      ],
      closing: ['Thank you for your business.', `— ${f.operationName}, through Duskhaul`],
    }),
  };
}
