// `npm start`: install what is missing, build the command line and the browser workbench, and
// serve the workbench on 127.0.0.1 (it loads the demo scenario itself). Stop with Ctrl+C.
// The command-line demo run is described in the README.
import { buildWeb } from './build-web.mjs';
import { ensureInstall, run } from './ensure-install.mjs';
import { serveWorkbench } from './serve.mjs';

ensureInstall();
run('node scripts/build-cli.mjs');
buildWeb();
await serveWorkbench().catch((error) => {
  console.error(`driftgrid: ${error.message}`);
  process.exit(1);
});
