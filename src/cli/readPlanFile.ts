import { parseCutPlan, parseWatchContext, type CutWindow, type WatchContext } from '../signal/index.ts';
import { UsageError, type CommandIo } from './command.ts';

/** A cut plan file (`{"cuts": [{receiver, from_c, to_c}]}`) for analyze and simulate; errors name the file. */
export async function readPlanFile(path: string, io: CommandIo): Promise<CutWindow[]> {
  return readPlan(path, io, parseCutPlan);
}

/** A plan file with its expected plateaus too (`cutbell plan --json` output), for analyze. */
export async function readWatchContextFile(path: string, io: CommandIo): Promise<Required<WatchContext>> {
  return readPlan(path, io, parseWatchContext);
}

async function readPlan<T>(path: string, io: CommandIo, parse: (text: string) => T): Promise<T> {
  let text: string;
  try {
    text = await io.readFile(path);
  } catch (error) {
    throw new UsageError(`cannot read plan ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
  try {
    return parse(text);
  } catch (error) {
    throw new UsageError(`plan ${path}: ${error instanceof Error ? error.message : String(error)}`);
  }
}
