/**
 * gaps on top of a run: the available area of each slice, its unsampled cells merged into gaps,
 * and the latitude belts, with indicator sites binned and placed as the occurrences were.
 */
import { placeRows, type PlacedRows } from '../analysis';
import {
  availableCells, gapsBySlice, gapSummary, latitudeBelts, occupiedCellsOf, pointsInSphericalPolygons, prepareGapGrid,
  type AvailableArea, type GapGrid, type GapSummary, type LatitudeBelts, type SliceGaps,
} from '../gaps';
import { summariseIndicators } from '../indicators';
import { reconstructFeaturesAt, type ReconstructionNote } from '../placement';
import type { OccurrenceTable } from '../table';
import { preparedOrError, type AreaPolygons } from './area-polygons';
import type { Run } from './run-analysis';

export interface GapInputs {
  /** The area's polygons, needed when settings.area is `file`. */
  readonly area?: AreaPolygons;
  /** Its name in messages (the file). */
  readonly areaSource?: string;
  /** Indicator sites, read as occurrences with the kind in place of the taxon. */
  readonly indicators?: OccurrenceTable;
  /** What the reader made of the indicator table, for the session's summary. */
  readonly indicatorsRead?: { readonly rowsRead: number; readonly rejectedOnReading: number };
}

export interface GapsRun {
  readonly gapGrid: GapGrid;
  readonly slices: readonly SliceGaps[];
  readonly gapSummary: GapSummary;
  readonly belts: LatitudeBelts;
  /** Where the indicator sites went, when indicators were given. */
  readonly indicators?: PlacedRows;
  /** Area features left out of a slice or clamped, when the area moves with the plates. */
  readonly areaNotes: readonly ReconstructionNote[];
  /** Counts for the session's summary: cells, and where the indicator sites went. */
  readonly summary: Readonly<Record<string, unknown>>;
}

export function runGaps(run: Run, inputs: GapInputs): GapsRun {
  const { settings, result, grid, scale, core } = run;
  const sliceCount = scale.names.length;
  const gapGrid = prepareGapGrid(grid);
  const occupied = occupiedCellsOf(result.cells, sliceCount);
  const areaNotes: ReconstructionNote[] = [];
  const maskOf = (area: AvailableArea): Uint8Array => {
    const mask = availableCells(gapGrid, area, occupied);
    if (core.within !== undefined) {
      // Inside a fixed region only its part of the area is available.
      const inRegion = pointsInSphericalPolygons(core.within, gapGrid.centreLat, gapGrid.centreLon, new Uint8Array(mask.length));
      for (let c = 0; c < mask.length; c++) mask[c] &= inRegion[c];
    }
    return mask;
  };
  let available: Uint8Array | Uint8Array[];
  if (settings.area.kind !== 'file') {
    available = maskOf({ kind: settings.area.kind });
  } else if (inputs.area === undefined) {
    throw new Error('the area is set to "file" but no area polygons are loaded; load a GeoJSON file or choose all or occupied');
  } else if (inputs.area.kind === 'fixed') {
    available = maskOf({ kind: 'polygons', polygons: inputs.area.polygons });
  } else {
    const { features } = inputs.area;
    const model = run.model;
    if (model === undefined) throw new Error(`${inputs.areaSource ?? 'the area'}: its features carry plate_id, so it moves with the plates; add a rotation model`);
    available = scale.names.map((name, s) => {
      const target = { slice: s + 1, name, ageMa: (scale.baseMa[s] + scale.topMa[s]) / 2 };
      const moved = reconstructFeaturesAt(features, model, target);
      areaNotes.push(...moved.notes);
      const geometries = moved.features.map((f) => f.geometry);
      return geometries.length === 0 ? maskOf({ kind: 'all' }).fill(0) : maskOf({ kind: 'polygons', polygons: preparedOrError(geometries, `${inputs.areaSource ?? 'area'} at slice ${s + 1}`) });
    });
  }
  const slices = gapsBySlice(gapGrid, available, occupied);
  let indicators: PlacedRows | undefined;
  let indicatorSummary;
  if (inputs.indicators !== undefined) {
    indicators = placeRows(inputs.indicators, core);
    const { taxon } = inputs.indicators;
    indicatorSummary = summariseIndicators(indicators.sliceOfRow, indicators.placement.lat, taxon.codes, taxon.values, sliceCount, settings.bandDeg);
  }
  const belts = latitudeBelts(
    gapGrid, { sliceOf: result.sliceOfRow, latDeg: result.palaeoLat, occupied, available, indicators: indicatorSummary }, settings.bandDeg,
  );
  const summary = {
    gridCells: grid.cellCount,
    ...(areaNotes.length === 0 ? {} : { areaFeaturesLeftOut: areaNotes.filter((n) => n.note.startsWith('left out')).length }),
    ...(indicators === undefined ? {} : {
      indicators: {
        rowsRead: inputs.indicatorsRead?.rowsRead, accepted: inputs.indicators?.count, rejectedOnReading: inputs.indicatorsRead?.rejectedOnReading,
        excludedFromSlices: indicators.exclusions.rows.length, ...(settings.within ? { outsideRegion: indicators.outsideRegion } : {}),
      },
    }),
  };
  return { gapGrid, slices, gapSummary: gapSummary(gapGrid, slices), belts, indicators, areaNotes, summary };
}
