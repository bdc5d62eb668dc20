import { html, type SafeHtml } from '../emails/html';
import type { ProposalPurpose } from '../../../shared/schemas/proposals';
import { humanWindow } from './proposal-emails';
import type { ProposalFacts } from './proposal-emails';

/** The one stylesheet of the link pages (CSP allows styles from our own origin only). */
export const respondCss = `
:root { color-scheme: light; }
body { margin: 0; background: #f4eedf; color: #221e17; font: 16px/1.55 "IBM Plex Sans", Arial, sans-serif; }
main { max-width: 34rem; margin: 2.5rem auto; background: #fffdf6; border: 1px solid #ddd1b4; padding: 1.75rem 2rem; }
h1 { font-size: 1.35rem; margin: 0 0 .75rem; }
.from { color: #6a604e; font-size: .9rem; margin: 0 0 1.25rem; letter-spacing: .02em; }
dl { display: grid; grid-template-columns: max-content 1fr; gap: .25rem 1rem; margin: 1rem 0 1.5rem; }
dt { color: #6a604e; } dd { margin: 0; font-weight: 600; }
label { display: block; margin: .9rem 0 .3rem; font-weight: 600; }
input, textarea { font: inherit; width: 100%; box-sizing: border-box; padding: .45rem .55rem; border: 1px solid #b9ab8a; background: #fff; }
textarea { min-height: 5rem; }
.row { display: flex; gap: 1rem; } .row > div { flex: 1; }
button { margin-top: 1.25rem; font: inherit; font-weight: 600; padding: .65rem 1.2rem; border: 0; background: #33402c; color: #fdf8ea; cursor: pointer; }
button.quiet { background: #7a3b2e; }
.error { background: #fbe6df; border-left: 4px solid #a3402b; padding: .5rem .75rem; }
.small { color: #6a604e; font-size: .88rem; margin-top: 1.5rem; }
`;

function page(title: string, body: SafeHtml): string {
  return html`<!doctype html>
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <meta name="viewport" content="width=device-width, initial-scale=1" />
        <meta name="referrer" content="no-referrer" />
        <meta name="robots" content="noindex" />
        <title>${title}</title>
        <link rel="stylesheet" href="/respond/assets/respond.css" />
      </head>
      <body>
        <main>${body}</main>
      </body>
    </html>`.value;
}

const facts = (f: ProposalFacts) =>
  html` <p class="from">
      ${f.operationName} · ${f.season} ${f.crop.replace(/-/g, ' ')} · for ${f.growerName}
    </p>
    <dl>
      <dt>Delivery window</dt>
      <dd>${humanWindow(f.deliveryStartOn, f.deliveryEndOn)}</dd>
      <dt>Colonies</dt>
      <dd>${f.colonies}</dd>
      ${
        f.siteNames.length
          ? html`<dt>Where</dt>
              <dd>${f.siteNames.join(', ')}</dd>`
          : ''
      }
      ${
        f.note
          ? html`<dt>Note</dt>
              <dd>${f.note}</dd>`
          : ''
      }
    </dl>`;

export interface CounterDraft {
  deliveryStartOn?: string;
  deliveryEndOn?: string;
  colonies?: string;
  note?: string;
}

/** The page behind a link: the proposal and a form whose button gives the answer. */
export function proposalPage(
  action: string,
  purpose: ProposalPurpose,
  f: ProposalFacts,
  draft: CounterDraft = {},
  problems: string[] = [],
): string {
  const errors = problems.length
    ? html`<div class="error" role="alert">
        <p>Please check:</p>
        <ul>
          ${problems.map((p) => html`<li>${p}</li>`)}
        </ul>
      </div>`
    : '';
  const note = (label: string) =>
    html`<label for="note">${label}</label
      ><textarea id="note" name="note" maxlength="2000">${draft.note ?? ''}</textarea>`;
  if (purpose === 'confirm')
    return page(
      'Confirm bee delivery',
      html`<h1>Confirm these delivery dates?</h1>
        ${facts(f)}${errors}
        <form method="post" action="${action}">
          ${note('Anything the crew should know? (optional)')}
          <button type="submit">Yes, confirm these dates</button>
        </form>
        <p class="small">Nothing changes until you press the button. This link works once.</p>`,
    );
  if (purpose === 'decline')
    return page(
      'Decline bee delivery dates',
      html`<h1>Decline these delivery dates?</h1>
        ${facts(f)}${errors}
        <form method="post" action="${action}">
          ${note('Why do these dates not work? (optional)')}
          <button type="submit" class="quiet">Decline these dates</button>
        </form>
        <p class="small">
          The beekeeper will be told and can send other dates. This link works once.
        </p>`,
    );
  return page(
    'Suggest other delivery dates',
    html`<h1>Suggest another delivery window</h1>
      ${facts(f)}${errors}
      <form method="post" action="${action}">
        <div class="row">
          <div>
            <label for="start">First day</label
            ><input
              id="start"
              name="deliveryStartOn"
              type="date"
              required
              value="${draft.deliveryStartOn ?? f.deliveryStartOn}"
            />
          </div>
          <div>
            <label for="end">Last day</label
            ><input
              id="end"
              name="deliveryEndOn"
              type="date"
              required
              value="${draft.deliveryEndOn ?? f.deliveryEndOn}"
            />
          </div>
        </div>
        <label for="colonies">Colonies (leave empty to keep ${f.colonies})</label>
        <input
          id="colonies"
          name="colonies"
          type="number"
          min="1"
          step="1"
          inputmode="numeric"
          value="${draft.colonies ?? ''}"
        />
        ${note('A note for the beekeeper (optional)')}
        <button type="submit">Send my suggestion</button>
      </form>
      <p class="small">
        The beekeeper will be told and will send new dates to confirm. This link works once.
      </p>`,
  );
}

/** After a successful answer. */
export function answeredPage(purpose: ProposalPurpose, f: ProposalFacts): string {
  const window = humanWindow(f.deliveryStartOn, f.deliveryEndOn);
  const text = {
    confirm: html`<h1>Thank you: delivery confirmed</h1>
      <p>
        ${f.operationName} will deliver ${f.colonies} colonies between ${window}. A confirmation
        with a calendar file is on its way to you by e-mail.
      </p>`,
    decline: html`<h1>Thank you: we have told the beekeeper</h1>
      <p>
        ${f.operationName} knows that ${window} does not work for you and can send other dates.
      </p>`,
    counter: html`<h1>Thank you: your suggestion is on its way</h1>
      <p>${f.operationName} will look at your dates and send a new proposal to confirm.</p>`,
  }[purpose];
  return page(
    'Thank you',
    html`${text}
      <p class="small">You can close this page.</p>`,
  );
}

/** 410: the link was used, replaced by newer dates, or expired. */
export function gonePage(): string {
  return page(
    'This link is no longer active',
    html`<h1>This link is no longer active</h1>
      <p>
        It has already been used, the beekeeper has since sent newer dates, or it has expired. Links
        in our e-mails work once, for a limited time, to keep your answers safe.
      </p>
      <p>
        If you still want to change the delivery dates, reply to the beekeeper's latest e-mail or
        sign in to your orchard portal.
      </p>`,
  );
}

/** 404: not a link we issued (mistyped or cut short by an e-mail program). */
export function unknownLinkPage(): string {
  return page(
    'Link not found',
    html`<h1>We do not recognise this link</h1>
      <p>
        It may have been cut short or changed when copied. Please open it again from the e-mail, or
        ask the beekeeper to send the dates again.
      </p>`,
  );
}

/** Any other failure, without details. */
export function troublePage(status: number): string {
  const message =
    status === 413
      ? 'What you sent is too long. Please shorten your note and try again.'
      : status === 503
        ? 'We cannot reach our records right now. Please try again in a few minutes; your link still works.'
        : 'Something went wrong on our side. Please try again in a few minutes; your link still works.';
  return page(
    'Please try again',
    html`<h1>Please try again</h1>
      <p>${message}</p>`,
  );
}
