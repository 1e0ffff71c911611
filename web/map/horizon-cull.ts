/**
 * Hides, on the globe, marks whose centre is on the far side of the horizon. Meant for deck's
 * billboards (camera-facing discs): they have a single depth, their centre's, so testing them
 * against the globe's depth clips them where the surface tilts away from the view; instead they
 * are drawn without a depth test and culled here. A point p on a sphere centred at the origin is
 * visible from the camera c exactly when the outward normal faces the camera: p · (c − p) > 0
 * (deck's globe common space has the sphere's centre at the origin).
 */
import { LayerExtension } from '@deck.gl/core';

const CULL_GLSL = /* glsl */ `
  if (project.projectionMode == PROJECTION_MODE_GLOBE) {
    vec3 p = geometry.position.xyz;
    if (dot(p, project.cameraPosition - p) < 0.0) position = vec4(0.0, 0.0, 2.0, 1.0); // beyond the far plane
  }
`;

export class HorizonCullExtension extends LayerExtension {
  static override extensionName = 'HorizonCullExtension';

  override getShaders(): { inject: Record<string, string> } {
    return { inject: { 'vs:DECKGL_FILTER_GL_POSITION': CULL_GLSL } };
  }
}

/** One shared instance: deck compares extensions when diffing layers. */
export const HORIZON_CULL = new HorizonCullExtension();
