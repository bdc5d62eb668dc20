// leaflet-geoman's build extends the global L when it runs, and only maps created afterwards get
// `map.pm`: load it (after the global is set) before the Atlas creates its map.
import './leaflet-global';
import '@geoman-io/leaflet-geoman-free';
import '@geoman-io/leaflet-geoman-free/dist/leaflet-geoman.css';
