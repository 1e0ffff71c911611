/** What both map views draw from: one slice of an analysis, a measure to colour cells by, and the layer switches. */
import { LitElement, type PropertyDeclarations } from 'lit';
import type { AnalysisView, Measure } from '../protocol';
import { DEFAULT_LAYERS, type LayerVisibility } from '../state/view-options';

export class SliceMapElement extends LitElement {
  static override properties: PropertyDeclarations = {
    view: { attribute: false }, slice: { type: Number }, measure: { type: String }, layers: { attribute: false },
  };
  declare view: AnalysisView | undefined;
  declare slice: number;
  declare measure: Measure;
  declare layers: LayerVisibility;

  constructor() {
    super();
    this.view = undefined;
    this.slice = 0;
    this.measure = 'occurrences';
    this.layers = DEFAULT_LAYERS;
  }
}
