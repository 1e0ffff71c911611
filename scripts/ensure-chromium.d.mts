// Types for scripts/ensure-chromium.mjs.
export declare const CHROMIUM_PATH: string;
/** Path of the Chromium executable; installs Debian's `chromium` with apt-get when it is missing. */
export declare function ensureChromium(): string;
