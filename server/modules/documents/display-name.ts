const maxLength = 120;

/**
 * A file name fit to show and to offer on download: NFC, no control, zero-width or bidi-override
 * characters (U+202E can disguise "exe" as "gpj"), no path separators or leading dots, at most
 * 120 characters with the extension kept. It is only ever a label, never a path.
 */
export function sanitiseDisplayName(original: string, fallbackExtension: string): string {
  let name = withoutControlCharacters(original.normalize('NFC'))
    .replace(/[\u200b-\u200f\u202a-\u202e\u2060-\u2069\ufeff]/g, '')
    .replace(/[\\/<>:"|?*]/g, '_')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/^[.\s]+/, '');
  const points = [...name];
  if (points.length > maxLength) {
    const extension = /\.[A-Za-z0-9]{1,8}$/.exec(name)?.[0] ?? '';
    name = points.slice(0, maxLength - extension.length).join('') + extension;
  }
  return name || `document${fallbackExtension}`;
}

// C0 and C1 control characters (NUL, newlines, escape …) and DEL.
function withoutControlCharacters(text: string): string {
  return [...text]
    .filter((ch) => {
      const code = ch.codePointAt(0) ?? 0;
      return code >= 0x20 && (code < 0x7f || code > 0x9f);
    })
    .join('');
}

/**
 * `Content-Disposition: attachment` with an ASCII fallback name and the exact name in RFC 5987
 * `filename*` form (RFC 6266).
 */
export function attachmentDisposition(name: string): string {
  const ascii = name.replace(/[^\x20-\x7e]|["\\%]/g, '_');
  const encoded = encodeURIComponent(name).replace(
    /['()*]/g,
    (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`,
  );
  return `attachment; filename="${ascii}"; filename*=UTF-8''${encoded}`;
}
