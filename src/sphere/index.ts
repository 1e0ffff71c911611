export { EARTH_RADIUS_KM, DEGREES, RADIANS } from './earth';
export {
  degreesToUnitVectors, degreesToUnitVectorsInto, writeUnitVector, unitVectorsToDegreesInto,
} from './unit-vectors';
export { centralAngle, unitVectorAngle } from './distance';
export { canonicalLatitude, canonicalLongitude, samePosition } from './position-identity';
export { convexHull, HULL_NONE_REASONS, GREAT_CIRCLE_TOLERANCE, type ConvexHull, type HullNoneReason } from './convex-hull';
export { smallestEnclosingCap, OPEN_HEMISPHERE_MARGIN } from './smallest-enclosing-cap';
export { polygonAreaSr, polygonAreaKm2 } from './polygon-area';
export { minimumSpanningTree, type SpanningTree } from './minimum-spanning-tree';
export { latitudeStats, type LatitudeStats } from './latitude-stats';
export { sphericalCentroid, CENTROID_UNDEFINED_BELOW, type SphericalCentroid } from './spherical-centroid';
export { ANTIPODAL_ARC, appendArcInterior, appendGreatCircleArc, continuousLongitude } from './great-circle-path';
export { splitAtAntimeridian } from './split-antimeridian';
export { hullLever, type HullLever } from './hull-lever';
export { spanWithoutDeg } from './span-without';
export { circleOutline } from './circle-outline';
