// Runs one benchmark module (its exported `run`) in a fresh process, so figures do not mix.
import { pathToFileURL } from 'node:url';
import { resolve } from 'node:path';

const file = process.argv[2];
if (!file) throw new Error('usage: tsx test/bench/run-one.ts <file.bench.ts>');
const module = (await import(pathToFileURL(resolve(file)).href)) as { run?: () => Promise<void> };
if (typeof module.run !== 'function') throw new Error(`${file} exports no run() function.`);
await module.run();
