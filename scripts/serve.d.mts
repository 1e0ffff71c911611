// Types for scripts/serve.mjs (plain JavaScript so that it runs before anything is installed).
export declare const DEFAULT_PORT: number;
export declare const MIME_TYPES: Readonly<Record<string, string>>;
export interface Served {
  /** `http://127.0.0.1:PORT/` */
  readonly url: string;
  close(): Promise<void>;
}
export declare function contentSecurityPolicy(indexHtml?: string): string;
export declare function serve(options: { root: string; port?: number }): Promise<Served>;
export declare function serveOnFreePort(options: { root: string; port?: number }): Promise<Served>;
export declare function serveWorkbench(argv?: readonly string[]): Promise<void>;
