/** What the WebGL map is called in its accessible name, by projection. */
export const GLOBE_MAP_NAMES = { globe: 'Globe', flat: 'Flat map (Web Mercator)' } as const;

export type GlobeProjection = keyof typeof GLOBE_MAP_NAMES;
