import type { AnalysisResult } from '../analysis';
import {
  SESSION_FORMAT, SESSION_FORMAT_VERSION, SESSION_FORMAT_VERSION_GAPS, sessionSummary, type Session, type SessionInputFiles,
} from '../export/session';
import { TOOL_VERSION } from '../version';
import type { RunSettings } from './run-settings';
import { settingsText } from './settings-text';

/** The input files of a run as the session records them; the front end knows their paths and digests. */
export type SessionInputs = SessionInputFiles;

/** What the reader made of the occurrence table, for the session's summary. */
export interface ReadCounts {
  readonly rowsRead: number;
  readonly accepted: number;
  readonly rejectedOnReading: number;
}

/** The session of a run: inputs, settings and what it found (with `gaps`, what runGaps found). A bins input is recorded only for own bins. */
export function buildSession(
  inputs: SessionInputs, settings: RunSettings, read: ReadCounts, result: AnalysisResult, gaps?: Readonly<Record<string, unknown>>,
): Session {
  const text = settingsText(settings);
  const area = settings.area.kind === 'file' ? inputs.area : undefined;
  const within = settings.within ? inputs.within : undefined;
  const usesFormat3 = area !== undefined || within !== undefined || inputs.indicators !== undefined
    || text.area !== undefined || text.bandDeg !== undefined || text.within !== undefined;
  return {
    format: SESSION_FORMAT,
    formatVersion: usesFormat3 ? SESSION_FORMAT_VERSION_GAPS : SESSION_FORMAT_VERSION,
    tool: { name: 'driftgrid', version: TOOL_VERSION },
    inputs: {
      occurrences: inputs.occurrences,
      ...(settings.bins.kind !== 'file' || inputs.bins === undefined ? {} : { bins: inputs.bins }),
      ...(inputs.rotation === undefined ? {} : { rotation: inputs.rotation }),
      ...(area === undefined ? {} : { area }),
      ...(within === undefined ? {} : { within }),
      ...(inputs.indicators === undefined ? {} : { indicators: inputs.indicators }),
    },
    settings: text,
    summary: { ...sessionSummary(read, result), ...(settings.within ? { outsideRegion: result.outsideRegion } : {}), ...(gaps === undefined ? {} : { gaps }) },
  };
}
