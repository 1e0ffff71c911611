/** Mean Earth radius R1 in km (IUGG; Moritz 1980, Geodetic Reference System 1980). */
export const EARTH_RADIUS_KM = 6371.0088;

export const DEGREES = 180 / Math.PI;
export const RADIANS = Math.PI / 180;
