/** Delimiters recognised in a header line, in order of preference when counts tie. */
export const DELIMITERS = [',', '\t', ';'] as const;
export type Delimiter = (typeof DELIMITERS)[number];

/**
 * The delimiter occurring most often outside double quotes in the line starting at `from`
 * (comma when none occurs: a one-column table). Undefined when the line does not end inside
 * `text` and more text may follow (`final` false).
 */
export function detectDelimiter(text: string, from: number, final: boolean): Delimiter | undefined {
  const counts = [0, 0, 0];
  let quoted = false;
  let i = from;
  for (; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 34) quoted = !quoted;
    else if (quoted) continue;
    else if (c === 10 || c === 13) break;
    else if (c === 44) counts[0]++;
    else if (c === 9) counts[1]++;
    else if (c === 59) counts[2]++;
  }
  if (i === text.length && !final) return undefined;
  let best = 0;
  for (let d = 1; d < counts.length; d++) if (counts[d] > counts[best]) best = d;
  return DELIMITERS[best];
}
