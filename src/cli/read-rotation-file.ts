import { InputError } from '../problems';
import { createRotationModel, poleTableFromRecords, type BeyondModel, type RotationModel } from '../rotation';
import { readRecordsFile } from './read-table-file';

/**
 * The rotation model in a pole table file (README, "Rotation model"). A file that cannot be read
 * as a table gives an error naming the file and line; a table that cannot be a model, every
 * problem by file, line, field and value (InputError).
 */
export async function readRotationFile(path: string, beyond: BeyondModel): Promise<RotationModel> {
  const { header, records } = await readRecordsFile(path).catch((error: unknown) => {
    throw new Error(`${path}: ${error instanceof Error ? error.message : String(error)}`);
  });
  try {
    return createRotationModel(poleTableFromRecords(header, records, path), { beyond });
  } catch (error) {
    if (error instanceof InputError) throw new Error(`${path} cannot be used as a rotation model:\n${error.message}`);
    throw error;
  }
}
