// How sensors and people report a head temperature: noise-free truth in, readings out.
export { createRandom, type Random } from './random.ts';
export { firstOrderLag } from './firstOrderLag.ts';
export { interpolateSorted } from './interpolate.ts';
export { sampleTimes } from './sampleTimes.ts';
export { sensorReadings } from './sensorReadings.ts';
export type { SensorOptions, SensorTrace } from './sensorOptions.ts';
export { handReadings, type HandReadingOptions } from './handReadings.ts';
