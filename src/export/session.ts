import type { AnalysisResult } from '../analysis';
/** Format marker and version of session files; bump the version when the shape changes. */
export const SESSION_FORMAT = 'driftgrid-session';
/** 2 added the rotation model (inputs.rotation, settings.rotateAt/preferModel/beyondModel); an
 * older tool must refuse such a file rather than rerun it without the model. 3 renamed the
 * assignment rules (`mid-age`, `whole-range`, `share:F`, `draw`) and the age fields of the column
 * map (`oldest_ma`, `youngest_ma`), which an older tool would not know. */
export const SESSION_FORMAT_VERSION = 3;
/** 4 added gaps and the fixed region (inputs.area/within/indicators, settings.area/bandDeg/within).
 * A session using none of them is still written as 3, so that coverage sessions read as before. */
export const SESSION_FORMAT_VERSION_GAPS = 4;
/** Versions this tool reads: a version 1 file is a run without a rotation model; versions 1 and 2
 * use the former names, which parseRunSettings (src/run) reads as the present ones. */
const READABLE_VERSIONS: readonly number[] = [1, 2, 3, 4];

/** An input file as the session recorded it. */
export interface SessionInput {
  /** Path relative to the session file's folder (absolute when on another drive). */
  readonly path: string;
  /** SHA-256 of the file's bytes, lower-case hex. */
  readonly sha256: string;
  readonly bytes: number;
}

/** Every setting that shapes the results; with the inputs, enough to reproduce every number. */
export interface SessionSettings {
  readonly bins: string;
  readonly assign: string;
  readonly seed: number;
  readonly grid: string;
  /** Explicit column choices, field → column header. */
  readonly map: Readonly<Record<string, string>>;
  /** `slice` or `occurrence` (format 2; a version 1 file means the defaults). */
  readonly rotateAt?: string;
  readonly preferModel?: boolean;
  /** `reject` or `clamp`. */
  readonly beyondModel?: string;
  /** The curves command's settings (absent in coverage sessions). */
  readonly quorum?: number;
  readonly trials?: number;
  readonly rarefy?: number;
  readonly ageTrials?: number;
  readonly regionKm?: number;
  /** `all`, `occupied` or `file` (format 4; written only when not `occupied`). */
  readonly area?: string;
  /** Latitude band width of belts.csv, degrees (format 4; written only when not 10). */
  readonly bandDeg?: number;
  /** True with a fixed region (inputs.within; format 4; written only when true). */
  readonly within?: boolean;
}

/** The input files a session records; area, within and indicators came with format 4. */
export interface SessionInputFiles {
  readonly occurrences: SessionInput;
  readonly bins?: SessionInput;
  readonly rotation?: SessionInput;
  readonly area?: SessionInput;
  readonly within?: SessionInput;
  readonly indicators?: SessionInput;
}

export interface Session {
  readonly format: typeof SESSION_FORMAT;
  readonly formatVersion: number;
  readonly tool: { readonly name: 'driftgrid'; readonly version: string };
  readonly inputs: SessionInputFiles;
  readonly settings: SessionSettings;
  /** What the run found, for the record; not read back. */
  readonly summary: Readonly<Record<string, unknown>>;
}

/** A session file as read: its settings as written, for parseRunSettings (src/run) to check. */
export type RecordedSession = Omit<Session, 'settings'> & { readonly settings: Readonly<Record<string, unknown>> };

/** What a run found, as the session file records it. */
export function sessionSummary(read: { readonly rowsRead: number; readonly accepted: number; readonly rejectedOnReading: number }, result: AnalysisResult): Record<string, unknown> {
  return {
    rowsRead: read.rowsRead,
    accepted: read.accepted,
    rejectedOnReading: read.rejectedOnReading,
    excludedFromSlices: result.exclusions.rows.length,
    placedFromTable: result.placement.fromTable,
    placedByModel: result.placement.fromModel,
    clampedByModel: result.placement.clamped,
    slices: result.slices.length,
    collectionsArePositions: result.collectionsArePositions,
  };
}

/** Session file text: stable key order and 2-space indentation so that runs can be diffed. */
export function sessionJson(session: Session): string {
  return JSON.stringify(session, null, 2) + '\n';
}

/**
 * Reads a session file, naming the first field outside the settings that is missing or of the
 * wrong kind; the settings are left to parseRunSettings (src/run), the one reader of settings.
 */
export function parseSession(text: string, source: string): RecordedSession {
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch (error) {
    throw new Error(`${source}: not a session file (invalid JSON: ${(error as Error).message}).`);
  }
  const root = requireObject(value, source, 'the file');
  if (root.format !== SESSION_FORMAT) throw new Error(`${source}: not a session file (field "format" should be "${SESSION_FORMAT}").`);
  if (typeof root.formatVersion !== 'number' || !READABLE_VERSIONS.includes(root.formatVersion)) {
    throw new Error(`${source}: session format version ${String(root.formatVersion)} is not supported (expected ${READABLE_VERSIONS.join(' or ')}).`);
  }
  const inputs = requireObject(root.inputs, source, 'inputs');
  const settings = requireObject(root.settings, source, 'settings');
  return {
    format: SESSION_FORMAT,
    formatVersion: root.formatVersion,
    tool: { name: 'driftgrid', version: requireString(requireObject(root.tool, source, 'tool').version, source, 'tool.version') },
    inputs: {
      occurrences: requireInput(inputs.occurrences, source, 'inputs.occurrences'),
      ...(inputs.bins === undefined ? {} : { bins: requireInput(inputs.bins, source, 'inputs.bins') }),
      ...(inputs.rotation === undefined ? {} : { rotation: requireInput(inputs.rotation, source, 'inputs.rotation') }),
      ...(inputs.area === undefined ? {} : { area: requireInput(inputs.area, source, 'inputs.area') }),
      ...(inputs.within === undefined ? {} : { within: requireInput(inputs.within, source, 'inputs.within') }),
      ...(inputs.indicators === undefined ? {} : { indicators: requireInput(inputs.indicators, source, 'inputs.indicators') }),
    },
    settings,
    summary: root.summary === undefined ? {} : requireObject(root.summary, source, 'summary'),
  };
}

function requireInput(value: unknown, source: string, field: string): SessionInput {
  const r = requireObject(value, source, field);
  const sha256 = requireString(r.sha256, source, `${field}.sha256`);
  if (!/^[0-9a-f]{64}$/.test(sha256)) throw new Error(`${source}: field "${field}.sha256" should be 64 lower-case hex digits.`);
  return { path: requireString(r.path, source, `${field}.path`), sha256, bytes: requireNumber(r.bytes, source, `${field}.bytes`) };
}

function requireObject(value: unknown, source: string, field: string): Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new Error(`${source}: field "${field}" should be an object.`);
  }
  return value as Record<string, unknown>;
}

function requireString(value: unknown, source: string, field: string): string {
  if (typeof value !== 'string') throw new Error(`${source}: field "${field}" should be a string.`);
  return value;
}

function requireNumber(value: unknown, source: string, field: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) throw new Error(`${source}: field "${field}" should be a number.`);
  return value;
}
