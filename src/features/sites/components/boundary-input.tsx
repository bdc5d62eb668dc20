import { useState } from 'react';
import { Textarea } from '@/components/ui/input';

/** Accepts a Polygon, or a Feature / FeatureCollection whose first geometry is one. */
export function polygonFromGeoJson(value: unknown): unknown {
  const v = value as {
    type?: string;
    geometry?: unknown;
    features?: Array<{ geometry?: unknown }>;
  };
  if (v?.type === 'Feature') return v.geometry;
  if (v?.type === 'FeatureCollection') return v.features?.[0]?.geometry;
  return value;
}

/**
 * A boundary pasted as GeoJSON text. Parsed text goes to the form as an object for the shared
 * schema to check; text that is not JSON goes as text, which the schema refuses.
 */
export function BoundaryInput({
  value,
  onChange,
  onBlur,
}: {
  value: unknown;
  onChange: (value: unknown) => void;
  onBlur?: () => void;
}) {
  const [text, setText] = useState(() => (value ? JSON.stringify(value) : ''));
  const [notJson, setNotJson] = useState(false);
  return (
    <>
      <Textarea
        rows={4}
        spellCheck={false}
        className="font-mono text-sm"
        placeholder='{"type":"Polygon","coordinates":[[[-120.1,36.6],[-120.09,36.6],[-120.09,36.61],[-120.1,36.6]]]}'
        value={text}
        onBlur={onBlur}
        onChange={(event) => {
          const next = event.target.value;
          setText(next);
          if (next.trim() === '') {
            setNotJson(false);
            onChange(null);
            return;
          }
          try {
            onChange(polygonFromGeoJson(JSON.parse(next)));
            setNotJson(false);
          } catch {
            setNotJson(true);
            onChange(next);
          }
        }}
      />
      {notJson && <p className="text-sm text-ember-200">This is not complete JSON yet.</p>}
    </>
  );
}
