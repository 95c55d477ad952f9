import { parseRunRecordJson, runFromTraceCsv, type RunRecord } from '../../run/index.ts';
import { saveFinishedRun, type ImportOutcome, type KeyValueStore } from '../../store/index.ts';

/**
 * Takes in a file the chemist picked: a run JSON from another phone, or a stand-alone logger's
 * trace CSV (analysed by the detector). Throws an Error whose message is the plain reason.
 */
export async function importRunFile(store: KeyValueStore, fileName: string, text: string, nowMs: number, device: string): Promise<{ run: RunRecord; outcome: ImportOutcome }> {
  const looksLikeJson = /\.json$/i.test(fileName) || text.trimStart().startsWith('{');
  let run: RunRecord;
  try {
    run = looksLikeJson
      ? parseRunRecordJson(text)
      : runFromTraceCsv(text, { fileName, id: `import-${nowMs.toString(36)}`, importedAt: new Date(nowMs).toISOString(), device });
  } catch (error) {
    throw new Error(`${fileName} was not imported: ${error instanceof Error ? error.message : String(error)}`);
  }
  const outcome = await saveFinishedRun(store, run, nowMs);
  return { run, outcome };
}
