/** The frame of the analysis: changed settings, a session file opened, an export file written. */
import { readSession, type RunSettings } from '../../src/run';
import type { ExportFile } from '../protocol';
import type { ActionContext } from './action-context';
import { download } from './download';
import { expectAnswer } from './worker-client';

export class SessionActions {
  constructor(private readonly context: ActionContext) {}

  async changeSettings(patch: Partial<RunSettings>): Promise<void> {
    const settings = { ...this.context.state.settings, ...patch };
    await this.context.run('Recomputing…', () => this.context.analyse(settings));
  }

  async exportFile(file: ExportFile): Promise<void> {
    await this.context.run(`Writing ${file}…`, async () => {
      const answer = expectAnswer(await this.context.client.send({ type: 'export', file }).answer, 'export');
      download(answer.bytes, file, answer.mime);
    });
  }

  /**
   * Applies a session file's settings, read as `driftgrid coverage --session` reads them (a bad
   * setting is refused in the same words); says so when it was made from other input files.
   */
  async openSession(file: File): Promise<void> {
    await this.context.run(`Opening ${file.name}…`, async () => {
      const { session, settings } = readSession(await file.text(), file.name);
      const table = this.context.state.table;
      const recorded = session.inputs.occurrences;
      const warning = table !== undefined && table.sha256 !== recorded.sha256
        ? `The session ${file.name} was made from ${recorded.path} (${recorded.bytes} bytes, SHA-256 ${recorded.sha256.slice(0, 12)}…), not the loaded table ${table.name}: its settings are applied to the loaded table; load ${recorded.path} to reproduce its numbers.`
        : undefined;
      await this.context.analyse(settings);
      if (warning !== undefined) this.context.store.update({ problem: warning });
    });
  }
}
