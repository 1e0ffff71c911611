/** Bringing data in: the demo at start, a table through the mapping step, optional inputs. */
import { DEFAULT_RUN_SETTINGS } from '../../src/run';
import { DEMO_EXTRAS, DEMO_TABLE } from '../demo-sources';
import type { ExtraRole, Source } from '../protocol';
import { errorText, SupersededError, type ActionContext } from './action-context';
import { decodeUrlState } from './url-state';
import { expectAnswer, type ProgressMessage } from './worker-client';

export class ImportActions {
  /** Optional inputs that came with the demo: they go when the user brings a table of their own. */
  private readonly demoExtras = new Set<ExtraRole>();

  constructor(private readonly context: ActionContext) {}

  /** Restores the address's view, loads the demo scenario and analyses it. */
  async start(hash: string): Promise<void> {
    const { store } = this.context;
    const { state: fromUrl, ignored } = decodeUrlState(hash);
    store.update({
      settings: fromUrl.settings, measure: fromUrl.measure, layers: fromUrl.layers, normaliseCurves: fromUrl.normaliseCurves, wholeScale: fromUrl.wholeScale,
      ...(fromUrl.mapView === undefined ? {} : { mapView: fromUrl.mapView }),
      ...(fromUrl.curveSeries === undefined ? {} : { curveSeries: fromUrl.curveSeries }),
      ...(ignored.length === 0 ? {} : { problem: `Ignored in the page address: ${ignored.join('; ')}.` }),
    });
    store.update({ busy: { label: 'Loading the demo scenario…', fraction: undefined } });
    try {
      await this.loadTable(DEMO_TABLE, {});
      for (const extra of DEMO_EXTRAS) {
        await this.loadExtraSource(extra.role, extra.source);
        this.demoExtras.add(extra.role);
      }
      await this.context.analyse(fromUrl.settings, fromUrl.sliceName).catch(async (error: unknown) => {
        if (error instanceof SupersededError) return;
        // Settings from an old or edited address may not apply: say so and fall back.
        store.update({ problem: `${errorText(error)} The default settings are used instead.` });
        const { bins, assign, grid } = DEFAULT_RUN_SETTINGS;
        await this.context.analyse({ ...this.context.state.settings, bins, assign, grid });
      });
      store.update({ phase: 'ready', busy: undefined });
    } catch (error) {
      if (error instanceof SupersededError) store.update({ phase: 'ready' });
      else store.update({ phase: 'error', busy: undefined, problem: errorText(error) });
    }
  }

  /** First step of an import: show the picked table's columns and first rows. */
  async pickTable(file: File): Promise<void> {
    await this.context.run(`Reading the first rows of ${file.name}…`, async () => {
      const answer = expectAnswer(await this.context.client.send({ type: 'preview', source: { kind: 'file', file } }).answer, 'preview');
      this.context.store.update({ pendingImport: { file, preview: answer.preview } });
    });
  }

  /** Second step: read the whole table with the confirmed columns, then analyse it. */
  async confirmImport(mapping: Readonly<Record<string, string>>): Promise<void> {
    const pending = this.context.state.pendingImport;
    if (pending === undefined) return;
    const ok = await this.context.run(`Reading ${pending.file.name}…`, async () => {
      await this.loadTable({ kind: 'file', file: pending.file }, mapping);
      await this.unloadDemoExtras();
      this.context.store.update({ pendingImport: undefined });
      await this.context.analyse(this.context.state.settings);
    });
    if (ok) this.context.store.update({ phase: 'ready' });
  }

  dismissImport(): void {
    this.context.store.update({ pendingImport: undefined });
  }

  cancel(): void {
    const id = this.context.state.busy?.cancelId;
    if (id !== undefined) this.context.client.cancel(id);
  }

  async loadExtra(role: ExtraRole, file: File): Promise<void> {
    await this.context.run(`Reading ${file.name}…`, async () => {
      await this.loadExtraSource(role, { kind: 'file', file });
      this.demoExtras.delete(role);
      const { settings } = this.context.state;
      await this.context.analyse(role === 'bins' ? { ...settings, bins: { kind: 'file' } } : settings);
    });
  }

  private async loadTable(source: Source, mapping: Readonly<Record<string, string>>): Promise<void> {
    const { store, client } = this.context;
    const onProgress = (p: ProgressMessage): void => {
      store.update({ busy: { label: `Reading ${source.kind === 'file' ? source.file.name : source.name}: ${p.rowsRead.toLocaleString('en')} rows`, fraction: p.totalBytes > 0 ? p.bytesRead / p.totalBytes : undefined, cancelId: p.id } });
    };
    const { answer } = client.send({ type: 'load-table', source, mapping }, onProgress);
    const loaded = expectAnswer(await answer, 'table-loaded');
    store.update({ table: loaded.summary });
  }

  /** The demo's poles, polygons and indicators do not belong with the user's own table. */
  private async unloadDemoExtras(): Promise<void> {
    const extras = { ...this.context.state.extras };
    for (const role of this.demoExtras) {
      expectAnswer(await this.context.client.send({ type: 'unload-extra', role }).answer, 'extra-unloaded');
      delete extras[role];
    }
    this.demoExtras.clear();
    this.context.store.update({ extras });
  }

  private async loadExtraSource(role: ExtraRole, source: Source): Promise<void> {
    const loaded = expectAnswer(await this.context.client.send({ type: 'load-extra', role, source }).answer, 'extra-loaded');
    this.context.store.update({ extras: { ...this.context.state.extras, [role]: loaded.summary } });
  }
}
