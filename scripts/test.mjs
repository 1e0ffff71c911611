// `npm test`: install what is missing, type-check, run the unit and reference tests.
import { ensureInstall, run } from './ensure-install.mjs';

ensureInstall();
run('npx tsc -p tsconfig.core.json');
run('npx tsc -p tsconfig.json');
run('npx vitest run');
