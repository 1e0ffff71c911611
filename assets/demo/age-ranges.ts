/**
 * Age ranges as collections report them: most span one stage, some two, some part of one,
 * and a few are narrow "dated" ranges that may straddle a boundary. Values are rounded as
 * they will be written, so the midpoint used for reconstruction is the written one.
 */
import { SCENARIO_TOP_MA, stageBase, stageIndexOf, stageTop, STAGE_BASES_MA } from './stages';
import { uniform, type Rng } from './random';

export interface AgeRange {
  readonly maxMa: number;
  readonly minMa: number;
}

function rounded(x: number, decimals: number): number {
  return Number(x.toFixed(decimals));
}

/** A reported age range around the true age `ageMa`. */
export function reportedRange(ageMa: number, rng: Rng): AgeRange {
  const s = stageIndexOf(ageMa), base = stageBase(s), top = stageTop(s);
  const u = rng();
  if (u < 0.45) return { maxMa: base, minMa: top };
  if (u < 0.65) {
    const older = s > 0 && (s + 1 === STAGE_BASES_MA.length || rng() < 0.5);
    return older ? { maxMa: stageBase(s - 1), minMa: top } : { maxMa: base, minMa: stageTop(s + 1) };
  }
  if (u < 0.9) {
    const width = Math.min(base - top, uniform(rng, 0.5, 4));
    const maxMa = Math.min(base, rounded(Math.min(base, ageMa + width * rng()), 1));
    const minMa = Math.max(top, rounded(maxMa - width, 1));
    return maxMa > minMa ? { maxMa, minMa } : { maxMa: base, minMa: top };
  }
  const half = uniform(rng, 0.1, 0.6);
  return { maxMa: rounded(ageMa + half, 2), minMa: rounded(Math.max(ageMa - half, SCENARIO_TOP_MA), 2) };
}

export function midpoint(range: AgeRange): number {
  return (range.maxMa + range.minMa) / 2;
}
