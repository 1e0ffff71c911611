/**
 * The age of the Earth as an upper bound on any geological age, Ma: the age of the oldest solids
 * of the Solar System, the calcium-aluminium-rich inclusions of chondritic meteorites, 4567.3 ±
 * 0.16 Ma by Pb–Pb dating (Connelly et al. 2012, Science 338:651; value quoted from memory),
 * rounded down to a whole Myr so that nothing older than the Solar System passes. An age beyond it
 * is a typing slip (5000 for 500), not a date.
 */
export const EARTH_AGE_MA = 4567;

/** What an age beyond EARTH_AGE_MA is told it should have been. */
export const WITHIN_EARTH_AGE = `an age no older than the Earth (${EARTH_AGE_MA} Ma)`;
