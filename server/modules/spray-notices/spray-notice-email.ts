import { renderEmail } from '../emails/email-layout';
import type { MailMessage } from '../emails/mailer';
import { sprayCaution } from '../../../shared/schemas/spray-notices';

export interface SprayNoticeFacts {
  growerName: string;
  siteName: string;
  /** Start and end written in the site's local time with offset, and the zone's name. */
  startsLocal: string;
  endsLocal: string;
  timeZone: string;
  product: string;
  notes: string;
  /** Whole hours between filing and the start of the spray. */
  hoursOfNotice: number;
  /** The contract's agreed notice, when the site is under contract. */
  agreedNoticeHours: number | null;
}

const readable = (local: string) =>
  local.replace('T', ' ').replace(/:00([+-]\d\d:\d\d)$/, ' (UTC$1)');

/** To a planner: a grower plans to spray where colonies are or will be. */
export function sprayNoticeEmail(to: string, f: SprayNoticeFacts, noticeUrl: string): MailMessage {
  const short = f.agreedNoticeHours !== null && f.hoursOfNotice < f.agreedNoticeHours;
  return {
    to,
    subject: `Spray notice: ${f.growerName}, ${f.siteName}, from ${readable(f.startsLocal)}`,
    ...renderEmail({
      greeting: 'Hello,',
      paragraphs: [
        `${f.growerName} has filed a spray notice for ${f.siteName}.`,
        ...(short
          ? [
              `This is shorter notice than agreed: ${f.hoursOfNotice} hours before the start, where the contract asks for ${f.agreedNoticeHours}.`,
            ]
          : []),
      ],
      facts: [
        ['Starts', readable(f.startsLocal)],
        ['Ends', readable(f.endsLocal)],
        ['Local time zone', f.timeZone],
        ['Product', f.product],
        ['Notice given', `${f.hoursOfNotice} hours`],
        ...(f.notes ? ([['Grower notes', f.notes]] as Array<[string, string]>) : []),
      ],
      actions: [
        {
          label: 'Open the notice',
          url: noticeUrl,
          hint: 'Acknowledge it and record whether you will move or cover the colonies.',
        },
      ],
      closing: [sprayCaution, '— Duskhaul'],
    }),
  };
}
