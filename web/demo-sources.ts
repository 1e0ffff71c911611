/** The demo scenario (made up by assets/demo's seeded generator), served with the app itself. */
import occurrencesUrl from '../assets/demo/occurrences.csv?url';
import polesUrl from '../assets/demo/poles.csv?url';
import landUrl from '../assets/demo/land.geojson?url';
import indicatorsUrl from '../assets/demo/indicators.csv?url';
import type { ExtraRole, Source } from './protocol';

export const DEMO_TABLE: Source = { kind: 'url', url: occurrencesUrl, name: 'occurrences.csv (demo)' };

export const DEMO_EXTRAS: ReadonlyArray<{ role: ExtraRole; source: Source }> = [
  { role: 'rotation', source: { kind: 'url', url: polesUrl, name: 'poles.csv (demo)' } },
  { role: 'polygons', source: { kind: 'url', url: landUrl, name: 'land.geojson (demo)' } },
  { role: 'indicators', source: { kind: 'url', url: indicatorsUrl, name: 'indicators.csv (demo)' } },
];
