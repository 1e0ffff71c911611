export { CellLookup } from './cell-lookup';
export { cellPolygon, polygonEdges, rewindForD3, slicePaths } from './d3-geometry';
export { DotRaster } from './dot-raster';
export { drawFigure, drawFigureFrame, type FigureDrawing, type FigureFrame } from './draw-figure';
export { drawMap, type Canvas2D, type MapPicture } from './draw-map';
export { escapeXml } from './escape-xml';
export { figurePng } from './figure-png';
export { FIGURE_PAD, figureLayout, keyOffsets, type FigureLayout } from './figure-layout';
export { fitFrame, frameInverseInto, type MapFrame } from './map-frame';
export { indicatorColour, legendStops, mapLegend, type LegendKey, type LegendStop, type MapLegend } from './map-legend';
export {
  EQUAL_AREA_PROJECTIONS, POLAR_CLIP_DEG, PROJECTION_CAPTIONS, PROJECTION_NAMES, REFERENCE_SIZE, SPHERE,
  createProjection, fittedProjection, isOnMap, referenceProjection, type EqualAreaProjection, type ReferenceProjection,
} from './map-projection';
export { MAP_STYLE, treeWidth } from './map-style';
export { mapSvg, type MapFigure } from './map-svg';
export { hasSlice } from './has-slice';
export { projectPointsInto } from './project-points';
export { ProjectedView, type CellColourGroup, type PolygonPaths } from './projected-view';
export { ViewGeometry } from './view-geometry';
export { entryAtMapPoint, mapPointToLonLatInto } from './map-hit';
