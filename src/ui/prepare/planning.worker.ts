/// <reference lib="webworker" />
// The planning worker: equilibrium sweeps and the cut plan off the page's thread, so typing
// stays smooth and a running Watch screen never stutters.
import { createPlanAnswerer } from './answerPlanRequest.ts';
import type { PlanMessage } from './planRequest.ts';

const answer = createPlanAnswerer();
const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = (event: MessageEvent<PlanMessage>) => scope.postMessage(answer(event.data));
