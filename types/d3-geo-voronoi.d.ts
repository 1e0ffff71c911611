// Minimal typings for the parts of d3-geo-voronoi we use (the package ships none).
declare module 'd3-geo-voronoi' {
  export interface GeoDelaunay {
    /** Delaunay edges as pairs of point indices. */
    edges: Array<[number, number]>;
    /** Delaunay triangles as triples of point indices. */
    triangles: Array<[number, number, number]>;
    /** Indices of the points on the convex hull, when the points fit in a hemisphere. */
    hull: number[];
    neighbors: number[][];
  }
  /** Points as [longitude, latitude] in degrees. */
  export function geoDelaunay(points: ArrayLike<[number, number]>): GeoDelaunay;
}
