export const HELP = `driftgrid — the geographic footprint of fossil occurrences, time slice by time slice

Usage:
  driftgrid coverage <occurrences.csv|tsv> [options]
  driftgrid coverage --session <results/session.json> --out <folder>
  driftgrid --version

coverage: read an occurrence table, bin it into time slices, grid every occurrence on an
equal-area grid and write slices.csv, cells.csv, cells.geojson, rejects.csv and session.json.

Options:
  --bins periods|epochs|stages|equal:N|<bins.csv>
                         time slices: a rank of the built-in chart, N-Myr bins, or your own
                         table (name, base_ma, top_ma). Default: stages
  --assign midpoint|within|overlap:F|random
                         how an occurrence's age range picks a slice. Default: midpoint
  --seed N               seed for --assign random. Default: 1
  --grid healpix:NSIDE|bands:DEG
                         equal-area grid. Default: healpix:32
  --map field=column     use this column for a field (repeatable), e.g. --map taxon=genus_name
  --out <folder>         where to write the results. Default: results
  --session <file>       repeat the run recorded in a session file (inputs must be unchanged)
  --quiet                print nothing but errors
  -h, --help             this text

Fields: taxon; max_ma + min_ma or interval; palaeo_lat + palaeo_lon and/or lat + lon + plate_id;
optional collection, reference, environment, group. See README.md for the formats and columns.
`;
