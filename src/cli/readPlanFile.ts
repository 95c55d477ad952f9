import { parseCutPlan, type CutWindow } from '../signal/index.ts';
import { UsageError, type CommandIo } from './command.ts';

/** A cut plan file (`{"cuts": [{receiver, from_c, to_c}]}`) for analyze and simulate; errors name the file. */
export async function readPlanFile(path: string, io: CommandIo): Promise<CutWindow[]> {
  let text: string;
  try {
    text = await io.readFile(path);
  } catch (error) {
    throw new UsageError(`cannot read plan ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
  try {
    return parseCutPlan(text);
  } catch (error) {
    throw new UsageError(`plan ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
}
