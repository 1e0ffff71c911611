/**
 * The column order the pole rows of the rotation tests are written in. The reader takes the
 * columns by name in any order, so this order (not the documented one) is as good as any.
 */
export const TEST_POLE_HEADER = ['plate_id', 'age_ma', 'pole_lat', 'pole_lon', 'angle_deg', 'relative_to'];
