/// <reference lib="webworker" />
/**
 * The analysis worker: reads the user's files and runs the core for the page, so that a large
 * table never blocks the page. One request at a time per kind; a cancel aborts the read in
 * progress between chunks.
 */
import type { Request, Response } from '../protocol';
import { readExtra, readOccurrenceTable } from './read-inputs';
import { CancelledError, sourceBlob, sourceName } from './stream-source';
import { tablePreview } from './table-preview';
import { Workbench } from './workbench';

declare const self: DedicatedWorkerGlobalScope;

/** Progress is posted at most this often (ms): enough for a smooth bar, cheap for the page. */
const PROGRESS_INTERVAL_MS = 100;

const workbench = new Workbench();
const running = new Map<number, AbortController>();

function post(message: Response, transfer: Transferable[] = []): void {
  self.postMessage(message, transfer);
}

async function handle(request: Request): Promise<void> {
  switch (request.type) {
    case 'preview': {
      const blob = await sourceBlob(request.source);
      post({ type: 'preview', id: request.id, preview: await tablePreview(blob, sourceName(request.source)) });
      return;
    }
    case 'load-table': {
      const controller = new AbortController();
      running.set(request.id, controller);
      let lastPost = 0;
      const table = await readOccurrenceTable(request.source, request.mapping, {
        signal: controller.signal,
        onBytes: (bytesRead, totalBytes, rowsRead) => {
          const now = performance.now();
          if (now - lastPost < PROGRESS_INTERVAL_MS && bytesRead < totalBytes) return;
          lastPost = now;
          post({ type: 'progress', id: request.id, bytesRead, totalBytes, rowsRead });
        },
      });
      workbench.setTable(table);
      const { read } = table;
      const columns = Object.fromEntries(
        Object.entries(read.columns.index).filter(([, at]) => at >= 0).map(([field, at]) => [field, read.columns.header[at]]),
      );
      post({
        type: 'table-loaded', id: request.id,
        summary: { name: table.name, bytes: table.blob.size, sha256: table.sha256, rowsRead: read.rowsRead, accepted: read.table.count, rejects: read.rejects, columns },
      });
      return;
    }
    case 'load-extra': {
      const extra = await readExtra(request.role, request.source);
      workbench.setExtra(extra);
      post({ type: 'extra-loaded', id: request.id, summary: extra.summary });
      return;
    }
    case 'unload-extra':
      workbench.unsetExtra(request.role);
      post({ type: 'extra-unloaded', id: request.id, role: request.role });
      return;
    case 'analyse': {
      const { view, transfer } = workbench.analyse(request.settings);
      post({ type: 'analysis', id: request.id, view }, transfer);
      return;
    }
    case 'cell-taxa':
      post({ type: 'cell-taxa', id: request.id, slice: request.slice, cell: request.cell, taxa: workbench.cellTaxa(request.slice, request.cell) });
      return;
    case 'export': {
      const { bytes, mime } = await workbench.exportFile(request.file);
      post({ type: 'export', id: request.id, file: request.file, bytes, mime }, [bytes.buffer as ArrayBuffer]);
      return;
    }
    case 'cancel':
      running.get(request.id)?.abort();
      return;
  }
}

self.onmessage = (event: MessageEvent<Request>) => {
  const request = event.data;
  handle(request)
    .catch((error: unknown) => {
      if (error instanceof CancelledError) post({ type: 'cancelled', id: request.id });
      else post({ type: 'error', id: request.id, message: error instanceof Error ? error.message : String(error) });
    })
    .finally(() => {
      if (request.type !== 'cancel') running.delete(request.id);
    });
};
