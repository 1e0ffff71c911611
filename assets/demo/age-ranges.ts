/**
 * Age ranges as collections report them: most span one stage, some two, some part of one,
 * and a few are narrow "dated" ranges that may straddle a boundary. Values are rounded as
 * they will be written, so the midpoint used for reconstruction is the written one.
 */
import { SCENARIO_TOP_MA, stageBase, stageIndexOf, stageTop, STAGE_BASES_MA } from './stages';
import { uniform, type Rng } from './random';

export interface AgeRange {
  readonly oldestMa: number;
  readonly youngestMa: number;
}

function rounded(x: number, decimals: number): number {
  return Number(x.toFixed(decimals));
}

/** A reported age range around the true age `ageMa`. */
export function reportedRange(ageMa: number, rng: Rng): AgeRange {
  const s = stageIndexOf(ageMa), base = stageBase(s), top = stageTop(s);
  const u = rng();
  if (u < 0.45) return { oldestMa: base, youngestMa: top };
  if (u < 0.65) {
    const older = s > 0 && (s + 1 === STAGE_BASES_MA.length || rng() < 0.5);
    return older ? { oldestMa: stageBase(s - 1), youngestMa: top } : { oldestMa: base, youngestMa: stageTop(s + 1) };
  }
  if (u < 0.9) {
    const width = Math.min(base - top, uniform(rng, 0.5, 4));
    const oldestMa = Math.min(base, rounded(Math.min(base, ageMa + width * rng()), 1));
    const youngestMa = Math.max(top, rounded(oldestMa - width, 1));
    return oldestMa > youngestMa ? { oldestMa, youngestMa } : { oldestMa: base, youngestMa: top };
  }
  const half = uniform(rng, 0.1, 0.6);
  return { oldestMa: rounded(ageMa + half, 2), youngestMa: rounded(Math.max(ageMa - half, SCENARIO_TOP_MA), 2) };
}

export function midpoint(range: AgeRange): number {
  return (range.oldestMa + range.youngestMa) / 2;
}
