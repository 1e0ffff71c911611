/** One row of the demo's pole table (poles.csv), values as written. */
export interface PoleRow {
  readonly plateId: number;
  readonly ageMa: number;
  readonly poleLat: number;
  readonly poleLon: number;
  readonly angleDeg: number;
  readonly relativeTo: number;
}

export const POLE_TABLE_HEADER = 'plate_id,relative_to,age_ma,pole_lat,pole_lon,angle_deg';
