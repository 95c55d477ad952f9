/// <reference lib="webworker" />
// The Watch prediction off the page's thread: the column simulator runs here, so the tap that
// starts a run does not freeze the screen while it integrates.
import { withPrediction } from './withPrediction.ts';
import type { PredictionRequest } from './predictOffThread.ts';

const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = (event: MessageEvent<PredictionRequest>) => {
  const { plan, charge, pressurePa, plates } = event.data;
  scope.postMessage(withPrediction(plan, charge, pressurePa, plates));
};
