export { IdleWorkController, type IdleStep } from './idle-work-controller';
export { RovingFocusController, type RovingFocusOptions, type RovingMove } from './roving-focus-controller';
export { SizeController, type SizeOptions } from './size-controller';
