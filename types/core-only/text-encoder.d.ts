// Only for tsconfig.core.json, as text-decoder.d.ts: the exports encode their text as UTF-8 bytes
// with the WHATWG TextEncoder every runtime of the core has. Only what it uses.
declare class TextEncoder {
  encode(input?: string): Uint8Array;
}
