/** The page's side of the worker: each request gets an id and a promise of its answer. */
import type { Request, Response } from '../protocol';

type Answer = Exclude<Response, { type: 'progress' }>;
type RequestBody = Request extends infer R ? (R extends Request ? Omit<R, 'id'> : never) : never;
export type ProgressMessage = Extract<Response, { type: 'progress' }>;

interface Pending {
  readonly resolve: (answer: Answer) => void;
  readonly reject: (error: Error) => void;
  readonly onProgress?: (progress: ProgressMessage) => void;
}

export class WorkerClient {
  private nextId = 1;
  private readonly pending = new Map<number, Pending>();

  constructor(private readonly worker: Worker) {
    worker.onmessage = (event: MessageEvent<Response>) => this.receive(event.data);
    worker.onerror = (event) => {
      const error = new Error(`the analysis worker failed: ${event.message}`);
      for (const p of this.pending.values()) p.reject(error);
      this.pending.clear();
    };
  }

  /** Sends a request; the promise rejects with the worker's message on error, and with a CancelledError-named error on cancel. */
  send(body: RequestBody, onProgress?: (progress: ProgressMessage) => void, transfer: Transferable[] = []): { id: number; answer: Promise<Answer> } {
    const id = this.nextId++;
    const answer = new Promise<Answer>((resolve, reject) => this.pending.set(id, { resolve, reject, onProgress }));
    this.worker.postMessage({ ...body, id }, transfer);
    return { id, answer };
  }

  cancel(id: number): void {
    this.worker.postMessage({ type: 'cancel', id } satisfies Request);
  }

  private receive(message: Response): void {
    const pending = this.pending.get(message.id);
    if (pending === undefined) return;
    if (message.type === 'progress') {
      pending.onProgress?.(message);
      return;
    }
    this.pending.delete(message.id);
    if (message.type === 'error') pending.reject(new Error(message.message));
    else if (message.type === 'cancelled') {
      const error = new Error('cancelled');
      error.name = 'CancelledError';
      pending.reject(error);
    } else pending.resolve(message);
  }
}

/** The answer of the expected type, or an error saying what came instead. */
export function expectAnswer<T extends Answer['type']>(answer: Answer, type: T): Extract<Answer, { type: T }> {
  if (answer.type !== type) throw new Error(`the worker answered "${answer.type}" where "${type}" was expected`);
  return answer as Extract<Answer, { type: T }>;
}
