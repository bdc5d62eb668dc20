import L from 'leaflet';

// protomaps-leaflet and leaflet-geoman extend the global `L` (their builds expect a script-tag
// Leaflet); give them the same instance react-leaflet uses. Import this module before them.
(globalThis as unknown as { L: typeof L }).L = L;

export { L };
