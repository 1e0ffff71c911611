/**
 * The plate tree through time: which plate is fixed, whether any chain of `relative_to` loops,
 * and how far back each plate's chain to the fixed plate is tabulated.
 *
 * A plate's parent changes only at the ages where some plate changes parent or some plate's
 * table ends ("event ages"), so between consecutive event ages the tree is one fixed graph,
 * and checking it once per stretch checks every age (the ages of each stretch (e₋, e] share
 * the intervals holding e, as an age on a tabulated age belongs to the younger interval).
 */
import { intervalAt, type PlateIntervals } from './plate-intervals';
import type { PoleTable } from './pole-table';
import { ProblemList } from '../problems';

/** How far back a plate can be reconstructed. */
export interface PlateReach {
  /** Oldest age in Ma to which the plate's chain to the fixed plate is tabulated without a gap. */
  readonly reachMa: number;
  /** The plate up the chain whose poles end at `reachMa` (Infinity reach: the fixed plate). */
  readonly limitedBy: number;
}

export interface PlateChains {
  /** The plate that appears only as relative_to. */
  readonly fixedPlate: number;
  readonly reach: ReadonlyMap<number, PlateReach>;
}

const FIXED = -2;
const NONE = -1;
const UNKNOWN = 0, VISITING = 1, RESOLVED = 2, BROKEN = 3;

function fixedPlateOf(table: PoleTable, plates: ReadonlyMap<number, PlateIntervals>, problems: ProblemList): number {
  const lines = new Map<number, number[]>();
  for (let r = 0; r < table.count; r++) {
    const p = table.relativeTo[r];
    if (plates.has(p)) continue;
    const list = lines.get(p) ?? [];
    list.push(table.line[r]);
    lines.set(p, list);
  }
  if (lines.size === 1) return [...lines.keys()][0];
  const named = [...lines].map(([p, l]) => `${p} (line${l.length > 1 ? 's' : ''} ${l.slice(0, 3).join(', ')}${l.length > 3 ? ', …' : ''})`);
  problems.add(lines.size === 0
    ? { field: 'relative_to', value: '', expected: 'one fixed reference plate, named in relative_to and given no poles of its own; every plate named here has poles' }
    : { field: 'relative_to', value: [...lines.keys()].join(', '), expected: `one fixed reference plate, but ${named.join(' and ')} all appear only as relative_to; give poles for all but one of them` });
  return NONE;
}

/** Event ages, increasing: each plate's oldest tabulated age and every change of parent. */
function eventAges(plates: ReadonlyMap<number, PlateIntervals>): number[] {
  const ages = new Set<number>();
  for (const p of plates.values()) {
    const n = p.parents.length;
    ages.add(p.ages[n]);
    for (let k = 0; k + 1 < n; k++) if (p.parents[k] !== p.parents[k + 1]) ages.add(p.ages[k + 1]);
  }
  return [...ages].sort((a, b) => a - b);
}

/**
 * Fixed plate, cycles and reach of every plate. Throws InputError when there is not exactly
 * one fixed plate or when plates form a cycle at some age (naming the plates and the ages).
 */
export function plateChainsOf(table: PoleTable, plates: ReadonlyMap<number, PlateIntervals>): PlateChains {
  const problems = new ProblemList();
  const fixedPlate = fixedPlateOf(table, plates, problems);
  const list = [...plates.values()];
  const index = new Map(list.map((p, i) => [p.plateId, i]));
  const parent = new Int32Array(list.length), state = new Uint8Array(list.length), stop = new Int32Array(list.length);
  const reachMa = new Float64Array(list.length), limitedBy = new Int32Array(list.length).fill(NONE);
  const cycles = new Set<string>();
  const events = eventAges(plates);
  events.forEach((age, j) => {
    list.forEach((p, i) => {
      const k = intervalAt(p, age);
      parent[i] = k < 0 ? NONE : p.parents[k] === fixedPlate ? FIXED : index.get(p.parents[k]) ?? NONE;
    });
    state.fill(UNKNOWN);
    for (let i = 0; i < list.length; i++) {
      const path: number[] = [];
      let cur = i, result: number = RESOLVED, end = NONE;
      while (state[cur] === UNKNOWN) {
        state[cur] = VISITING;
        path.push(cur);
        const p = parent[cur];
        if (p === FIXED) break;
        if (p === NONE) { result = BROKEN; end = cur; break; }
        if (state[p] === VISITING) {
          const loop = path.slice(path.indexOf(p)).map((x) => list[x].plateId);
          const key = [...loop].sort((a, b) => a - b).join(',');
          if (!cycles.has(key)) {
            cycles.add(key);
            problems.add({
              field: 'relative_to', value: [...loop, loop[0]].join(' → '),
              expected: `a chain of relative_to ending at the fixed plate, but from ${j === 0 ? 0 : events[j - 1]} to ${age} Ma each of these plates moves relative to the next, in a cycle`,
            });
          }
          result = BROKEN;
          break;
        }
        if (state[p] !== VISITING && state[p] !== UNKNOWN) { result = state[p]; end = stop[p]; break; }
        cur = p;
      }
      for (const x of path) { state[x] = result; stop[x] = end; }
    }
    for (let i = 0; i < list.length; i++) {
      if (limitedBy[i] !== NONE) continue;
      if (state[i] === RESOLVED) reachMa[i] = age;
      else limitedBy[i] = stop[i] === NONE ? list[i].plateId : list[stop[i]].plateId;
    }
  });
  problems.throwIfAny(table.source);
  const reach = new Map<number, PlateReach>();
  list.forEach((p, i) => reach.set(p.plateId, { reachMa: reachMa[i], limitedBy: limitedBy[i] === NONE ? p.plateId : limitedBy[i] }));
  return { fixedPlate, reach };
}
