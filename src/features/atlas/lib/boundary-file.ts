import { kml } from '@tmcw/togeojson';

/** Largest boundary file read in the browser (the server takes about 900 kB of GeoJSON). */
export const maxBoundaryFileBytes = 900_000;

/**
 * A chosen boundary file as GeoJSON text: GeoJSON is passed through, KML (Google Earth and
 * most farm-mapping tools export it) is converted here, since the browser has the XML parser.
 */
export async function boundaryFileToGeoJsonText(file: File): Promise<string> {
  if (file.size > maxBoundaryFileBytes)
    throw new Error(
      `${file.name} is ${Math.round(file.size / 1000)} kB; boundary files can be at most ${maxBoundaryFileBytes / 1000} kB.`,
    );
  const text = await file.text();
  const looksLikeKml = /\.kml$/i.test(file.name) || text.trimStart().startsWith('<');
  if (!looksLikeKml) return text;
  const document = new DOMParser().parseFromString(text, 'application/xml');
  if (document.getElementsByTagName('parsererror').length > 0)
    throw new Error(`${file.name} is not readable KML (the XML is broken).`);
  return JSON.stringify(kml(document));
}
