/** HTML-escapes text for element content and quoted attribute values. */
export function escapeHtml(value: string): string {
  return value.replace(
    /[&<>"']/g,
    (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] ?? c,
  );
}

/** Already-safe HTML, passed through `html` untouched. */
export class SafeHtml {
  constructor(readonly value: string) {}
  toString() {
    return this.value;
  }
}

/** A template tag that escapes every interpolated value unless it is SafeHtml (or a list of it). */
export function html(strings: TemplateStringsArray, ...values: unknown[]): SafeHtml {
  const piece = (v: unknown): string =>
    v instanceof SafeHtml
      ? v.value
      : Array.isArray(v)
        ? v.map(piece).join('')
        : v === null || v === undefined || v === false
          ? ''
          : escapeHtml(String(v));
  return new SafeHtml(
    strings.reduce((out, s, i) => out + s + (i < values.length ? piece(values[i]) : ''), ''),
  );
}
