/**
 * Why one row of a table is left out (rejects.csv, the page's rejects panel): the field at
 * fault and a reason a person can act on, naming the value and what was expected.
 */
export interface RowProblem {
  /** Our field name (`taxon`, `oldest_ma`, `plate_id`…), `age` for the age range, or `row` for the whole record. */
  readonly field: string;
  readonly reason: string;
}
