// @vitest-environment happy-dom
// The page's actions against a stand-in worker: what the user sees while an import runs, when
// it is cancelled, and which slice stays current when the bins change.
import { describe, expect, it } from 'vitest';
import type { SliceMetrics } from '../../src/analysis';
import type { AnalysisView, Request, Response, TablePreview, TableSummary } from '../../web/protocol';
import { INITIAL_STATE, type AppState } from '../../web/state/app-state';
import { Store } from '../../web/state/store';
import { WorkbenchActions } from '../../web/state/workbench-actions';
import { WorkerClient } from '../../web/state/worker-client';

/** A worker that records requests and answers only when told to. */
class StandInWorker {
  onmessage: ((event: MessageEvent<Response>) => void) | null = null;
  onerror: ((event: ErrorEvent) => void) | null = null;
  readonly requests: Request[] = [];
  postMessage(request: Request): void {
    this.requests.push(request);
  }
  answer(response: Response): void {
    this.onmessage?.({ data: response } as MessageEvent<Response>);
  }
  last(type: Request['type']): Request {
    const found = this.requests.filter((r) => r.type === type).pop();
    if (found === undefined) throw new Error(`no ${type} request`);
    return found;
  }
}

const slice = (name: string, baseMa: number, topMa: number, occurrences: number) => ({ name, baseMa, topMa, occurrences }) as SliceMetrics;
const viewOf = (slices: SliceMetrics[]) => ({ slices }) as unknown as AnalysisView;
const table = (name: string) => ({ name, rejects: [] }) as unknown as TableSummary;
const flush = () => new Promise((resolve) => setTimeout(resolve, 0));

function setUp(state: Partial<AppState> = {}) {
  const worker = new StandInWorker();
  const store = new Store<AppState>({ ...INITIAL_STATE, ...state });
  const actions = new WorkbenchActions(store, new WorkerClient(worker as unknown as Worker));
  return { worker, store, actions };
}

describe('an import', () => {
  it('shows its progress, and when cancelled keeps the previous table and says so', async () => {
    const file = new File(['taxon\n'], 'big.csv');
    const { worker, store, actions } = setUp({ table: table('earlier.csv'), pendingImport: { file, preview: {} as TablePreview } });
    const done = actions.confirmImport({});
    await flush();
    const load = worker.last('load-table');
    worker.answer({ type: 'progress', id: load.id, bytesRead: 50, totalBytes: 200, rowsRead: 1234 });
    expect(store.state.busy).toMatchObject({ fraction: 0.25, cancelId: load.id });
    expect(store.state.busy?.label).toContain('1,234 rows');
    actions.cancel();
    expect(worker.last('cancel').id).toBe(load.id);
    worker.answer({ type: 'cancelled', id: load.id });
    await done;
    expect(store.state.busy).toBeUndefined();
    expect(store.state.table?.name).toBe('earlier.csv');
    expect(store.state.problem).toBe('Import cancelled; the previous table is still loaded.');
  });

  it("shows the worker's message when the table cannot be read", async () => {
    const file = new File(['x'], 'bad.csv');
    const { worker, store, actions } = setUp({ pendingImport: { file, preview: {} as TablePreview } });
    const done = actions.confirmImport({});
    await flush();
    worker.answer({ type: 'error', id: worker.last('load-table').id, message: 'bad.csv: line 1: header …' });
    await done;
    expect(store.state.problem).toBe('bad.csv: line 1: header …');
    expect(store.state.pendingImport).toBeDefined(); // the mapping step stays open to try again
  });
});

describe('changing the bins', () => {
  it('moves to the new slice that holds the old slice mid-age', async () => {
    const stages = [slice('s1', 100, 96, 3), slice('s2', 96, 90, 4), slice('s3', 90, 70, 5)];
    const { worker, store, actions } = setUp({ view: viewOf(stages), slice: 2 });
    const done = actions.changeSettings({ bins: { kind: 'equal', widthMyr: 5 } });
    await flush();
    const request = worker.last('analyse');
    expect(request).toMatchObject({ settings: { bins: { kind: 'equal', widthMyr: 5 } } });
    const equal = [slice('a', 100, 95, 1), slice('b', 95, 90, 1), slice('c', 90, 85, 1), slice('d', 85, 80, 1)];
    worker.answer({ type: 'analysis', id: request.id, view: viewOf(equal) });
    await done;
    expect(store.state.slice).toBe(3); // s3's mid-age, 80 Ma, lies in d (85–80)
    expect(store.state.settings.bins).toEqual({ kind: 'equal', widthMyr: 5 });
    expect(location.hash).toContain('bins=equal%3A5');
  });
});

describe('analyses asked for in quick succession', () => {
  const stages = [slice('s1', 100, 96, 3), slice('s2', 96, 90, 4)];
  const epochs = [slice('e1', 100, 80, 7)];

  it('apply only the latest answer, and stay busy until the latest call ends', async () => {
    const { worker, store, actions } = setUp({ view: viewOf(stages) });
    const first = actions.changeSettings({ seed: 2 });
    await flush();
    const firstRequest = worker.last('analyse');
    const second = actions.changeSettings({ seed: 3 });
    await flush();
    const secondRequest = worker.last('analyse');
    expect(secondRequest.id).not.toBe(firstRequest.id);

    worker.answer({ type: 'analysis', id: firstRequest.id, view: viewOf(epochs) });
    await first;
    expect(store.state.view?.slices).toEqual(stages); // the older answer is dropped
    expect(store.state.busy).toBeDefined(); // the newer call still runs
    expect(store.state.problem).toBeUndefined();

    worker.answer({ type: 'analysis', id: secondRequest.id, view: viewOf(epochs) });
    await second;
    expect(store.state.view?.slices).toEqual(epochs);
    expect(store.state.settings.seed).toBe(3);
    expect(store.state.busy).toBeUndefined();
  });

  it('drop the failure of a call a newer one has replaced', async () => {
    const { worker, store, actions } = setUp({ view: viewOf(stages) });
    const first = actions.changeSettings({ seed: 2 });
    await flush();
    const firstRequest = worker.last('analyse');
    const second = actions.changeSettings({ seed: 3 });
    await flush();
    worker.answer({ type: 'error', id: firstRequest.id, message: 'too late to matter' });
    worker.answer({ type: 'analysis', id: worker.last('analyse').id, view: viewOf(epochs) });
    await Promise.all([first, second]);
    expect(store.state.problem).toBeUndefined();
    expect(store.state.view?.slices).toEqual(epochs);
  });
});

describe('opening a session file', () => {
  const sessionFile = (settings: Record<string, unknown>) => new File([JSON.stringify({
    format: 'driftgrid-session', formatVersion: 2, tool: { name: 'driftgrid', version: '0.1.0' },
    inputs: { occurrences: { path: 'occurrences.csv', sha256: 'a'.repeat(64), bytes: 10 } },
    settings: { bins: 'stages', assign: 'mid-age', seed: 1, grid: 'healpix:32', map: {}, ...settings },
  })], 'session.json');

  it('refuses an unknown setting in the words of the command line, and asks nothing of the worker', async () => {
    const { worker, store, actions } = setUp();
    await actions.openSession(sessionFile({ rotateAt: 'sideways', beyondModel: 'wrap' }));
    expect(store.state.problem).toBe(
      'session.json, settings.rotateAt "sideways": expected slice or occurrence\nsession.json, settings.beyondModel "wrap": expected reject or clamp',
    );
    expect(worker.requests.filter((r) => r.type === 'analyse')).toEqual([]);
  });

  it('applies the settings it holds', async () => {
    const { worker, store, actions } = setUp();
    const done = actions.openSession(sessionFile({ grid: 'bands:10', rotateAt: 'occurrence' }));
    await new Promise((resolve) => setTimeout(resolve, 20));
    const request = worker.last('analyse');
    expect(request).toMatchObject({ settings: { grid: { kind: 'bands', degrees: 10 }, rotateAt: 'occurrence' } });
    worker.answer({ type: 'analysis', id: request.id, view: viewOf([slice('s1', 100, 96, 3)]) });
    await done;
    expect(store.state.settings.grid).toEqual({ kind: 'bands', degrees: 10 });
  });
});
