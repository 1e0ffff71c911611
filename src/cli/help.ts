export const HELP = `driftgrid — the geographic footprint of fossil occurrences, time slice by time slice

Usage:
  driftgrid coverage <occurrences.csv|tsv> [options]
  driftgrid coverage --session <results/session.json> --out <folder>
  driftgrid curves <occurrences.csv|tsv> [options] [--quorum Q] [--trials N] [--rarefy N]
                   [--age-trials N] [--region-km KM]
  driftgrid gaps <occurrences.csv|tsv> --area <land.geojson>|occupied|all [--indicators <indicators.csv>] [options]
  driftgrid rotate <table.csv|tsv> --rotation <poles.csv> [options]
  driftgrid rotate <land.geojson> --rotation <poles.csv> [--bins …] [--single-file] [--out <folder>]
  driftgrid --version

coverage: read an occurrence table, bin it into time slices, place every occurrence on the
palaeoglobe, grid it on an equal-area grid and write slices.csv, cells.csv, cells.geojson,
rejects.csv and session.json.

curves: the coverage run, then richness slice by slice, raw and standardised (SQS, shared cells,
circular regions, rarefaction), beside the footprint; writes curves.csv, regions.geojson,
rejects.csv and session.json, and flags slices where raw richness moved with the footprint but
standardised richness did not.

gaps: the run of coverage, then per slice the part of the available area with no occurrence,
merged into gaps (gaps.csv, gaps.geojson), and occurrences, cells and indicator sites per
latitude band with the shift of the sampled latitudes from the slice before (belts.csv).

rotate: carry present-day positions back with a rotation model. A table is written back
unchanged with palaeo_lat, palaeo_lon and placed_at_ma appended (<name>-rotated.csv,
and rejects.csv); GeoJSON polygons with a plate_id property are written once per slice
(slice-001-<name>.geojson …, or one file with --single-file), with rotate-notes.csv.

Options:
  --bins periods|epochs|stages|equal:N|<bins.csv>
                         time slices: a rank of the built-in chart, N-Myr bins, or your own
                         table (name, base_ma, top_ma). Default: stages
  --assign mid-age|whole-range|share:F|draw
                         how an occurrence's age range picks a slice. Default: mid-age
  --seed N               seed for --assign draw and every draw of curves. Default: 1
  --grid healpix:NSIDE|bands:DEG
                         equal-area grid (coverage). Default: healpix:32
  --map field=column     use this column for a field (repeatable), e.g. --map taxon=genus_name
  --rotation <poles.csv> rotation model: plate_id, relative_to, age_ma, pole_lat, pole_lon, angle_deg
  --rotate-at slice|occurrence
                         rotate each row to its slice's mid-age, or to its own age (the
                         mid-age or draw of --assign). Default: slice
  --prefer-model         coverage: rows with lat, lon and plate_id are placed by the model even
                         when the table gives palaeo_lat/palaeo_lon
  --beyond-model reject|clamp
                         an age older than the model reaches for a plate: leave the row out
                         (listed in rejects.csv), or place it at the oldest age reached. Default: reject
  --quorum Q             curves: SQS target coverage, 0 < Q <= 1. Default: 0.5
  --trials N             curves: SQS trials per slice. Default: 200
  --rarefy N             curves: rarefied richness in N occurrences (Hurlbert). Default: none
  --age-trials N         curves: raw richness over N draws of each row's age. Default: none
  --region-km KM         curves: radius of the circular regions, 0 < KM < 10000. Default: 1500
  --within <region.geojson>
                         coverage, gaps: keep only occurrences placed inside this fixed region
                         (counted in the summary, not listed as rejects)
  --area <land.geojson>|occupied|all
                         gaps: where occurrences could be: polygons (moved with the plates when
                         they carry plate_id), the cells occupied in any slice, or the whole
                         sphere. Default: occupied
  --band-deg W           gaps: width of the latitude bands of belts.csv, degrees. Default: 10
  --indicators <file>    gaps: climate indicator sites (kind; ages and positions as for occurrences)
  --single-file          rotate GeoJSON: one file, with slice, slice_name and
                         placed_at_ma on every feature
  --out <folder>         where to write the results. Default: results
  --session <file>       repeat the coverage, curves or gaps run recorded in a session file (inputs must be unchanged)
  --quiet                print nothing but errors
  -h, --help             this text

Fields: taxon; oldest_ma + youngest_ma or interval; palaeo_lat + palaeo_lon and/or lat + lon + plate_id;
optional collection, reference, environment, group. See README.md for the formats and columns.
`;
