export { ReadingBuffer } from './readingBuffer.ts';
export { headRateCPerMin } from './headRate.ts';
