import { html, type SafeHtml } from './html';

/** The parts of an e-mail in the product's one simple shape. */
export interface EmailContent {
  greeting: string;
  paragraphs: string[];
  /** Label/value lines, e.g. the delivery window. */
  facts?: Array<[string, string]>;
  /** Links to follow, each on its own line. */
  actions?: Array<{ label: string; url: string; hint?: string }>;
  closing: string[];
}

/** Renders the same content as a plain-text part and an HTML part. */
export function renderEmail(content: EmailContent): { text: string; html: string } {
  const facts = content.facts ?? [];
  const actions = content.actions ?? [];
  const text = [
    content.greeting,
    '',
    ...content.paragraphs.flatMap((p) => [p, '']),
    ...(facts.length ? [...facts.map(([k, v]) => `  ${k}: ${v}`), ''] : []),
    ...actions.flatMap((a) => [
      `${a.label}:`,
      `  ${a.url}`,
      ...(a.hint ? [`  ${a.hint}`] : []),
      '',
    ]),
    ...content.closing,
  ].join('\n');

  const factRows: SafeHtml[] = facts.map(
    ([k, v]) =>
      html`<tr>
        <td style="padding:2px 12px 2px 0;color:#5b5346">${k}</td>
        <td style="padding:2px 0"><strong>${v}</strong></td>
      </tr>`,
  );
  const actionRows: SafeHtml[] = actions.map(
    (a) =>
      html`<p style="margin:10px 0">
        <a
          href="${a.url}"
          style="display:inline-block;padding:9px 16px;background:#2f3b2a;color:#fdf8ec;text-decoration:none;border-radius:4px"
          >${a.label}</a
        >${a.hint ? html`<br /><span style="font-size:13px;color:#5b5346">${a.hint}</span>` : ''}
      </p>`,
  );
  const body = html`<!doctype html>
    <html lang="en">
      <head>
        <meta charset="utf-8" />
        <title>Duskhaul</title>
      </head>
      <body
        style="margin:0;padding:24px;background:#f6f1e4;font-family:Arial,Helvetica,sans-serif;color:#211d16;font-size:15px;line-height:1.5"
      >
        <div
          style="max-width:560px;margin:0 auto;background:#fffdf7;border:1px solid #e3d9c2;padding:24px"
        >
          <p>${content.greeting}</p>
          ${content.paragraphs.map((p) => html`<p>${p}</p>`)}
          ${
            facts.length
              ? html`<table role="presentation" style="border-collapse:collapse;margin:8px 0 16px">
                  ${factRows}
                </table>`
              : ''
          }
          ${actionRows} ${content.closing.map((p) => html`<p style="color:#5b5346">${p}</p>`)}
        </div>
      </body>
    </html>`;
  return { text, html: body.value };
}
