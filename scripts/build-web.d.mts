// Types for scripts/build-web.mjs.
/** dist/web, where the workbench is built. */
export declare const webOut: string;
/** Runs `vite build` into dist/web and returns that folder. */
export declare function buildWeb(): string;
