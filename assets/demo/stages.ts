/**
 * The stages of the scenario, from the base of the Permian to the top of the Cretaceous, taken
 * from the project's built-in chart (src/time, ICS). They shape the demo's age ranges (some rows
 * span one stage, some two, some part of one) and the edges of the sampling windows.
 */
import { chartIntervals, findChartInterval, type ChartInterval } from '../../src/time';

function chartUnit(name: string): ChartInterval {
  const unit = findChartInterval(name);
  if (unit === undefined) throw new Error(`The built-in chart has no unit named "${name}".`);
  return unit;
}

export const SCENARIO_BASE_MA = chartUnit('Permian').baseMa;
export const SCENARIO_TOP_MA = chartUnit('Cretaceous').topMa;

/** Stage bases, oldest first (Asselian … Maastrichtian). */
export const STAGE_BASES_MA: readonly number[] = chartIntervals('stage')
  .filter((s) => s.baseMa <= SCENARIO_BASE_MA && s.topMa >= SCENARIO_TOP_MA)
  .map((s) => s.baseMa);

/** Base of the oldest and top of the youngest of a run of stages, Ma. */
export function stageRunSpan(oldest: string, youngest: string): { baseMa: number; topMa: number } {
  return { baseMa: chartUnit(oldest).baseMa, topMa: chartUnit(youngest).topMa };
}

/** Index of the stage holding `ageMa` (top < age <= base; the scenario top goes to the last). */
export function stageIndexOf(ageMa: number): number {
  for (let i = STAGE_BASES_MA.length - 1; i >= 0; i--) if (ageMa <= STAGE_BASES_MA[i]) return i;
  throw new Error(`stageIndexOf: age ${ageMa} Ma is older than the scenario base ${SCENARIO_BASE_MA} Ma.`);
}

export function stageBase(index: number): number {
  return STAGE_BASES_MA[index];
}

export function stageTop(index: number): number {
  return index + 1 < STAGE_BASES_MA.length ? STAGE_BASES_MA[index + 1] : SCENARIO_TOP_MA;
}
