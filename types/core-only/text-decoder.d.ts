// Only for tsconfig.core.json (tsconfig.json, with DOM types, excludes it). The core compiles without DOM or Node types, yet decodes text: every
// runtime it runs in (Node, the browser, workers) has the WHATWG TextDecoder. Only what it uses.
declare class TextDecoder {
  constructor(label?: string, options?: { fatal?: boolean; ignoreBOM?: boolean });
  decode(input?: Uint8Array, options?: { stream?: boolean }): string;
}
