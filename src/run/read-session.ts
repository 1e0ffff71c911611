import { parseSession, type RecordedSession } from '../export/session';
import { parseRunSettings } from './parse-run-settings';
import type { RunSettings } from './run-settings';

/**
 * A session file's record and its settings, checked by parseRunSettings: the command line's
 * `--session` and the page's "open session" refuse the same file with the same words.
 */
export function readSession(text: string, source: string): { readonly session: RecordedSession; readonly settings: RunSettings } {
  const session = parseSession(text, source);
  return { session, settings: parseRunSettings(session.settings, { name: source, naming: 'setting' }) };
}
