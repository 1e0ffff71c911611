import type { RotationStatus } from './rotation-status';

/** A rotation asked of a model that cannot give it: a plate it does not have, or an age older
 * than it reaches for the plate. The message names the plate, the ages and the model. */
export class RotationLookupError extends Error {
  readonly status: RotationStatus;
  readonly plateId: number;
  readonly ageMa: number;

  constructor(status: RotationStatus, plateId: number, ageMa: number, message: string) {
    super(message);
    this.name = 'RotationLookupError';
    this.status = status;
    this.plateId = plateId;
    this.ageMa = ageMa;
  }
}
