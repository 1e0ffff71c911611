/** A side panel that reads the page state and acts through the workbench's actions (set by dg-app). */
import { LitElement, type PropertyDeclarations } from 'lit';
import type { AppState } from '../state/app-state';
import type { WorkbenchActions } from '../state/workbench-actions';

export class WorkbenchPanel extends LitElement {
  static override properties: PropertyDeclarations = { state: { attribute: false }, actions: { attribute: false } };
  declare state: AppState | undefined;
  declare actions: WorkbenchActions | undefined;

  constructor() {
    super();
    this.state = undefined;
    this.actions = undefined;
  }
}
