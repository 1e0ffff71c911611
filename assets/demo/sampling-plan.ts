/**
 * How sampling widens and narrows through the scenario (invented). Each window runs over a
 * run of stages and samples some landmasses at some intensity; a window with a belt samples
 * only sites whose palaeolatitude lies within `beltHalfWidthDeg` of the first landmass's centre
 * at the window's mid-age.
 */
export interface SamplingWindow {
  readonly oldestStage: string;
  readonly youngestStage: string;
  readonly plates: readonly number[];
  /** Collections per Myr. */
  readonly collectionsPerMyr: number;
  readonly beltHalfWidthDeg: number | null;
}

export const SAMPLING_WINDOWS: readonly SamplingWindow[] = [
  { oldestStage: 'Asselian', youngestStage: 'Artinskian', plates: [101, 201, 301, 401], collectionsPerMyr: 23, beltHalfWidthDeg: null },
  { oldestStage: 'Kungurian', youngestStage: 'Capitanian', plates: [101, 301], collectionsPerMyr: 17, beltHalfWidthDeg: null },
  { oldestStage: 'Wuchiapingian', youngestStage: 'Olenekian', plates: [101], collectionsPerMyr: 12, beltHalfWidthDeg: 5 },
  { oldestStage: 'Anisian', youngestStage: 'Carnian', plates: [101, 201], collectionsPerMyr: 17, beltHalfWidthDeg: null },
  { oldestStage: 'Norian', youngestStage: 'Rhaetian', plates: [101, 201, 301, 401], collectionsPerMyr: 23, beltHalfWidthDeg: null },
  { oldestStage: 'Hettangian', youngestStage: 'Toarcian', plates: [101, 301], collectionsPerMyr: 17, beltHalfWidthDeg: 8 },
  { oldestStage: 'Aalenian', youngestStage: 'Tithonian', plates: [101, 201, 301, 401, 501, 601], collectionsPerMyr: 28, beltHalfWidthDeg: null },
  { oldestStage: 'Berriasian', youngestStage: 'Barremian', plates: [201], collectionsPerMyr: 15, beltHalfWidthDeg: 4 },
  { oldestStage: 'Aptian', youngestStage: 'Albian', plates: [201, 401, 501], collectionsPerMyr: 23, beltHalfWidthDeg: null },
  { oldestStage: 'Cenomanian', youngestStage: 'Maastrichtian', plates: [101, 201, 301, 401, 501, 601], collectionsPerMyr: 33, beltHalfWidthDeg: null },
];
