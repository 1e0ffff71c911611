import { parseGridName } from '../../src/grid';
import { cellsGeoJson } from '../../src/export/cells-geojson';
const grid = parseGridName('healpix:32');
const n = 136593;
const cells = { count: n, slice: new Uint32Array(n), cell: new Uint32Array(n), occurrences: new Uint32Array(n), collections: new Uint32Array(n), taxa: new Uint32Array(n) };
for (let k = 0; k < n; k++) { cells.slice[k] = Math.floor(k / 1366); cells.cell[k] = (k * 7919) % 12288; }
let t = performance.now(); const ring = []; for (let c = 0; c < 12288; c++) ring.push(grid.cellRing(c, 1)); console.log('rings', performance.now() - t, ring.reduce((a, r) => a + r.length, 0) / 12288);
t = performance.now(); cellsGeoJson(cells, grid); console.log('geojson', performance.now() - t);
t = performance.now(); cellsGeoJson(cells, grid); console.log('geojson', performance.now() - t);
