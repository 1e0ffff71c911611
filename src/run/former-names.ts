import { normaliseHeader } from '../table';

/**
 * Names that session files written before format version 3 used, each read as its present name:
 * the assignment rules and the two age fields of the column map. Only recorded settings (session
 * files, the page's messages) are read this way; command-line options take the present names.
 */
const FORMER_ASSIGN: Readonly<Record<string, string>> = { midpoint: 'mid-age', within: 'whole-range', random: 'draw' };
const FORMER_SHARE_PREFIX = 'overlap:';
const PRESENT_SHARE_PREFIX = 'share:';
const FORMER_FIELDS: Readonly<Record<string, string>> = { [normaliseHeader('max_ma')]: 'oldest_ma', [normaliseHeader('min_ma')]: 'youngest_ma' };

/** A recorded assignment rule by its present name (`midpoint` → `mid-age`, `overlap:0.5` → `share:0.5`); other text as it is. */
export function presentAssignName(value: string): string {
  const text = value.trim().toLowerCase();
  if (text.startsWith(FORMER_SHARE_PREFIX)) return PRESENT_SHARE_PREFIX + text.slice(FORMER_SHARE_PREFIX.length);
  return FORMER_ASSIGN[text] ?? value;
}

/** A column-map field by its present name (`max_ma` → `oldest_ma`, `min_ma` → `youngest_ma`); other fields as they are. */
export function presentFieldName(field: string): string {
  return FORMER_FIELDS[normaliseHeader(field)] ?? field;
}
