import { format, parseISO } from 'date-fns';
import { renderEmail } from '../emails/email-layout';
import { deliveryWindowAttachment } from '../emails/delivery-calendar';
import type { MailMessage } from '../emails/mailer';

/** What every proposal e-mail says about the contract. */
export interface ProposalFacts {
  contractId: string;
  proposalId: string;
  operationName: string;
  growerName: string;
  crop: string;
  season: number;
  siteNames: string[];
  deliveryStartOn: string;
  deliveryEndOn: string;
  colonies: number;
  note: string;
  /** Counts the proposals of the contract, for the calendar's SEQUENCE. */
  sequence: number;
}

/** "Fri 5 Feb 2027" */
export const humanDate = (date: string) => format(parseISO(date), 'EEE d MMM yyyy');
/** "Fri 5 Feb 2027 to Thu 11 Feb 2027" */
export const humanWindow = (start: string, end: string) =>
  start === end ? humanDate(start) : `${humanDate(start)} to ${humanDate(end)}`;
const cropName = (crop: string) => crop.replace(/-/g, ' ');
const where = (f: ProposalFacts) =>
  f.siteNames.length ? f.siteNames.join(', ') : `your ${cropName(f.crop)} blocks`;

/** To a grower contact: the proposed window with the three single-use links. */
export function proposalEmail(
  to: string,
  f: ProposalFacts,
  links: { confirm: string; decline: string; counter: string },
  expiresOn: string,
): MailMessage {
  const body = renderEmail({
    greeting: `Hello from ${f.operationName},`,
    paragraphs: [
      `We would like to set our colonies on ${where(f)} for the ${f.season} ${cropName(f.crop)} bloom. Please tell us whether the delivery window below suits you.`,
    ],
    facts: [
      ['Delivery window', humanWindow(f.deliveryStartOn, f.deliveryEndOn)],
      ['Colonies', String(f.colonies)],
      ...(f.note ? ([['Our note', f.note]] as Array<[string, string]>) : []),
    ],
    actions: [
      { label: 'Yes, these dates work', url: links.confirm },
      { label: 'No, these dates do not work', url: links.decline },
      { label: 'Suggest another window', url: links.counter },
    ],
    closing: [
      `Each link opens a page where you confirm your answer; nothing changes until you press its button. The links work once and expire on ${humanDate(expiresOn)}. Please do not forward this e-mail: anyone with these links can answer for you.`,
      'The attached calendar file holds the proposed window.',
      `— ${f.operationName}, sent through Duskhaul`,
    ],
  });
  return {
    to,
    subject: `Bee delivery for ${f.season} ${cropName(f.crop)}: ${humanWindow(f.deliveryStartOn, f.deliveryEndOn)}?`,
    ...body,
    attachments: [
      deliveryWindowAttachment({
        contractId: f.contractId,
        title: `Bees arrive (${f.colonies} colonies, ${f.operationName}) — proposed`,
        description: `Proposed delivery window for ${f.colonies} colonies on ${where(f)}. Not yet agreed.`,
        startOn: f.deliveryStartOn,
        endOn: f.deliveryEndOn,
        agreed: false,
        sequence: f.sequence,
      }),
    ],
  };
}

export type GrowerAnswer =
  | { kind: 'confirm'; note: string }
  | { kind: 'decline'; note: string }
  | {
      kind: 'counter';
      deliveryStartOn: string;
      deliveryEndOn: string;
      colonies: number | null;
      note: string;
    };

/** To a planner: what the grower answered, with a link to the contract. */
export function answerEmail(
  to: string,
  f: ProposalFacts,
  answer: GrowerAnswer,
  contractUrl: string,
): MailMessage {
  const window = humanWindow(f.deliveryStartOn, f.deliveryEndOn);
  const headline = {
    confirm: `${f.growerName} confirmed delivery on ${window}.`,
    decline: `${f.growerName} declined the delivery window ${window}.`,
    counter: `${f.growerName} asked for another delivery window.`,
  }[answer.kind];
  const facts: Array<[string, string]> = [
    ['Contract', `${f.season} ${cropName(f.crop)}, ${where(f)}`],
    ['Proposed', `${window}, ${f.colonies} colonies`],
  ];
  if (answer.kind === 'counter')
    facts.push([
      'Grower suggests',
      `${humanWindow(answer.deliveryStartOn, answer.deliveryEndOn)}${answer.colonies ? `, ${answer.colonies} colonies` : ''}`,
    ]);
  if (answer.note) facts.push(['Grower note', answer.note]);
  const next = {
    confirm: 'The contract is now agreed and its delivery window updated.',
    decline: 'The contract is marked turned down. You can send other dates from the contract.',
    counter:
      'The contract stays offered. Send a new proposal from the contract when you have an answer.',
  }[answer.kind];
  return {
    to,
    subject: headline,
    ...renderEmail({
      greeting: 'Hello,',
      paragraphs: [headline, next],
      facts,
      actions: [{ label: 'Open the contract', url: contractUrl }],
      closing: ['— Duskhaul'],
    }),
  };
}

/** To a grower contact after confirming: the agreed window as a calendar file. */
export function agreedEmail(to: string, f: ProposalFacts): MailMessage {
  const window = humanWindow(f.deliveryStartOn, f.deliveryEndOn);
  return {
    to,
    subject: `Bee delivery agreed: ${window}`,
    ...renderEmail({
      greeting: `Hello from ${f.operationName},`,
      paragraphs: [
        `Thank you. We have your confirmation and will deliver ${f.colonies} colonies to ${where(f)} between ${window}.`,
        'Bees are set down at night. Please keep truck access open and tell us at least the agreed hours ahead of any spraying while the colonies are in place.',
      ],
      facts: [
        ['Delivery window', window],
        ['Colonies', String(f.colonies)],
      ],
      closing: ['The attached calendar file holds the agreed window.', `— ${f.operationName}`],
    }),
    attachments: [
      deliveryWindowAttachment({
        contractId: f.contractId,
        title: `Bees arrive (${f.colonies} colonies, ${f.operationName})`,
        description: `Agreed delivery window for ${f.colonies} colonies on ${where(f)}.`,
        startOn: f.deliveryStartOn,
        endOn: f.deliveryEndOn,
        agreed: true,
        sequence: f.sequence + 1,
      }),
    ],
  };
}
