import type { AnalysisResult } from '../analysis';
import { SESSION_FORMAT, SESSION_FORMAT_VERSION, sessionSummary, type Session, type SessionInput } from '../export/session';
import { TOOL_VERSION } from '../version';
import type { RunSettings } from './run-settings';
import { settingsText } from './settings-text';

/** The input files of a run as the session records them; the front end knows their paths and digests. */
export interface SessionInputs {
  readonly occurrences: SessionInput;
  readonly bins?: SessionInput;
  readonly rotation?: SessionInput;
}

/** What the reader made of the occurrence table, for the session's summary. */
export interface ReadCounts {
  readonly rowsRead: number;
  readonly accepted: number;
  readonly rejectedOnReading: number;
}

/** The session of a run: inputs, settings and what it found. A bins input is recorded only for own bins. */
export function buildSession(inputs: SessionInputs, settings: RunSettings, read: ReadCounts, result: AnalysisResult): Session {
  return {
    format: SESSION_FORMAT,
    formatVersion: SESSION_FORMAT_VERSION,
    tool: { name: 'driftgrid', version: TOOL_VERSION },
    inputs: {
      occurrences: inputs.occurrences,
      ...(settings.bins.kind !== 'file' || inputs.bins === undefined ? {} : { bins: inputs.bins }),
      ...(inputs.rotation === undefined ? {} : { rotation: inputs.rotation }),
    },
    settings: settingsText(settings),
    summary: sessionSummary(read, result),
  };
}
