// `npm start`: install what is missing, build, and run the demo scenario through the command line.
// (The browser workbench will take over this command once it exists.)
import { ensureInstall, run } from './ensure-install.mjs';

ensureInstall();
run('node scripts/build-cli.mjs');
run('node bin/driftgrid.js coverage assets/demo/occurrences.csv --bins stages --grid healpix:32 --out results/demo');
