import { open, writeFile } from 'node:fs/promises';
import { basename, extname } from 'node:path';
import { rotateNotesCsv, type FeatureNote } from '../export/rotate-notes-csv';
import { FEATURE_COLLECTION_END, FEATURE_COLLECTION_START, FEATURE_SEPARATOR, featureText } from '../export/rotated-geojson';
import { sliceFileName } from '../export/slice-file-name';
import { plateFeaturesOf, reconstructFeaturesAt, type ReconstructedFeature } from '../placement';
import type { RotationModel } from '../rotation';
import type { RotateContext } from './rotate-command';
import { readGeoJsonFile } from './read-geojson-file';
import { modelNotes } from './summary';
import { prepareTargets } from './write-results';

export const NOTES_FILE = 'rotate-notes.csv';

/** Oldest finite age the model reaches for any plate (where equal bins end for polygons). */
function oldestReach(model: RotationModel): number {
  return Math.max(0, ...model.plateIds().map((p) => model.reachMa(p) ?? 0));
}

/**
 * rotate on GeoJSON: the polygons carried to each slice's mid-age, one FeatureCollection
 * per slice or all in one file (--single-file); every feature left out of a slice, clamped, or
 * rewound on reading is listed in rotate-notes.csv.
 */
export async function rotateGeoJson(context: RotateContext): Promise<void> {
  const { options, model } = context;
  const { input } = options;
  const { features, notes: readingNotes } = plateFeaturesOf(await readGeoJsonFile(input), input);
  const scale = context.scaleFor(oldestReach(model));
  const count = scale.names.length;
  const sliceNames = scale.names.map((name, s) => sliceFileName(s + 1, count, name, 'geojson'));
  const outputs = options.singleFile ? [`${basename(input, extname(input))}-rotated.geojson`] : sliceNames;
  const targets = await prepareTargets(options.out, [...outputs, NOTES_FILE], context.inputs);
  const notes: FeatureNote[] = [...readingNotes];
  const single = options.singleFile ? await open(targets[0], 'w') : undefined;
  let written = 0, slicesWithFeatures = 0, clamped = 0;
  try {
    await single?.write(FEATURE_COLLECTION_START);
    for (let s = 0; s < count; s++) {
      const target = { slice: s + 1, name: scale.names[s], ageMa: 0.5 * (scale.baseMa[s] + scale.topMa[s]) };
      const result = reconstructFeaturesAt(features, model, target);
      notes.push(...result.notes);
      clamped += result.features.filter((f) => f.ageMa !== target.ageMa).length;
      const text = result.features.map((f: ReconstructedFeature) =>
        featureText(f.feature.id, f.feature.properties, { slice: target.slice, sliceName: target.name, ageMa: f.ageMa }, f.geometry)).join(FEATURE_SEPARATOR);
      if (single === undefined) await writeFile(targets[s], FEATURE_COLLECTION_START + text + FEATURE_COLLECTION_END);
      else if (text !== '') await single.write((written > 0 ? FEATURE_SEPARATOR : '') + text);
      written += result.features.length;
      if (result.features.length > 0) slicesWithFeatures++;
    }
    await single?.write(FEATURE_COLLECTION_END);
  } finally {
    await single?.close();
  }
  const notesPath = targets[targets.length - 1];
  await writeFile(notesPath, rotateNotesCsv(notes));
  if (options.quiet) return;
  const leftOut = features.length * count - written;
  const out = [
    `features read: ${features.length}; slices: ${count} (${slicesWithFeatures} with features)`,
    `rotated with ${model.source}: ${written} feature-slices${clamped > 0 ? ` (${clamped} clamped to the oldest age the model reaches for their plate)` : ''}; left out: ${leftOut}${leftOut > 0 || notes.length > 0 ? ` (see ${NOTES_FILE})` : ''}`,
    ...(readingNotes.length > 0 ? [`  ${readingNotes.length} note(s) on reading, e.g. ${readingNotes[0].note}`] : []),
    ...modelNotes(model),
    options.singleFile ? `wrote ${targets[0]}, ${notesPath}` : `wrote ${count} files in ${options.out} (${sliceNames[0]} … ${sliceNames[count - 1]}), ${notesPath}`,
    `elapsed: ${((performance.now() - context.started) / 1000).toFixed(2)} s`,
  ];
  process.stdout.write(out.join('\n') + '\n');
}
