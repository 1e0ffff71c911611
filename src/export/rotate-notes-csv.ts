import { csvLine, DECIMALS, trimmed } from './csv-text';

export const ROTATE_NOTES_COLUMNS = ['feature', 'plate_id', 'slice', 'slice_name', 'placed_at_ma', 'note'] as const;

/** One note on one input feature; slice fields absent for a note on the feature as read. */
export interface FeatureNote {
  /** Position of the feature in the input, from 1. */
  readonly feature: number;
  readonly plateId: number;
  readonly slice?: number;
  readonly sliceName?: string;
  readonly ageMa?: number;
  readonly note: string;
}

/** `rotate-notes.csv`: every feature left out of a slice, clamped, or changed on reading. */
export function rotateNotesCsv(notes: readonly FeatureNote[]): string {
  return [
    csvLine(ROTATE_NOTES_COLUMNS),
    ...notes.map((n) => csvLine([
      String(n.feature), String(n.plateId), n.slice === undefined ? '' : String(n.slice), n.sliceName ?? '',
      n.ageMa === undefined ? '' : trimmed(n.ageMa, DECIMALS.ageMa), n.note,
    ])),
  ].join('');
}
