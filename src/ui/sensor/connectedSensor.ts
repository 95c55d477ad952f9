import type { ReadingSource } from '../../sensor/readingSource.ts';
import type { SensorSetup } from '../../sensor/sensorSetup.ts';

/** What the connection flow hands to the app: the setup as chosen and its bridge, already started. */
export interface ConnectedSensor {
  setup: SensorSetup;
  bridge: ReadingSource;
}
