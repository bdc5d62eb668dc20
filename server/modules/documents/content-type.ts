import { documentContentTypes, type DocumentContentType } from '../../../shared/schemas/documents';

export interface DetectedType {
  contentType: DocumentContentType;
  extension: string;
}

const pngSignature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
const geoJsonTypes = new Set([
  'FeatureCollection',
  'Feature',
  'Point',
  'MultiPoint',
  'LineString',
  'MultiLineString',
  'Polygon',
  'MultiPolygon',
  'GeometryCollection',
]);

const detected = (contentType: DocumentContentType): DetectedType => ({
  contentType,
  extension: documentContentTypes[contentType],
});

/** Strict UTF-8 text without a byte-order mark, or null for bytes that are not UTF-8. */
function utf8Text(bytes: Uint8Array): string | null {
  try {
    return new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    return null;
  }
}

/**
 * The type of a file by its content alone (magic bytes, or parsing for text formats): PDF, PNG,
 * JPEG, GeoJSON or other JSON, KML. Null for anything else (HTML, scripts, executables …).
 * KML with a DOCTYPE is refused, so no entity tricks reach any XML reader later.
 */
export function detectDocumentType(bytes: Uint8Array): DetectedType | null {
  const head = Buffer.from(bytes.subarray(0, 8));
  if (head.subarray(0, 5).toString('latin1') === '%PDF-') return detected('application/pdf');
  if (head.length === 8 && head.equals(pngSignature)) return detected('image/png');
  if (head[0] === 0xff && head[1] === 0xd8 && head[2] === 0xff) return detected('image/jpeg');

  const text = utf8Text(bytes);
  if (text === null || text.includes('\u0000')) return null;
  const start = text.trimStart();
  if (start.startsWith('{') || start.startsWith('[')) {
    let value: unknown;
    try {
      value = JSON.parse(start);
    } catch {
      return null;
    }
    const type = (value as { type?: unknown } | null)?.type;
    return typeof type === 'string' && geoJsonTypes.has(type) && !Array.isArray(value)
      ? detected('application/geo+json')
      : detected('application/json');
  }
  if (/^(<\?xml[^>]*\?>\s*)?(<!--[\s\S]*?-->\s*)*<kml[\s>]/.test(start))
    return detected('application/vnd.google-earth.kml+xml');
  return null;
}

/** Feature and vertex counts of a GeoJSON value, walked without recursion. */
export function geoJsonSize(value: unknown): { features: number; vertices: number } {
  let features = 0;
  let vertices = 0;
  const stack: unknown[] = [value];
  while (stack.length) {
    const item = stack.pop();
    if (Array.isArray(item)) {
      if (item.length >= 2 && item.every((n) => typeof n === 'number')) vertices += 1;
      else for (const child of item) stack.push(child);
    } else if (item && typeof item === 'object') {
      const record = item as Record<string, unknown>;
      if (record.type === 'Feature') features += 1;
      for (const key of ['features', 'geometry', 'geometries', 'coordinates'])
        if (key in record) stack.push(record[key]);
    }
  }
  return { features, vertices };
}
