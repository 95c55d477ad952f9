import { browserSensorEnvironment, wallClockS } from '../../sensor/browserEnvironment.ts';
import { adaptReadingSource, type SensorLiveSource } from '../../sensor/liveSourceAdapter.ts';
import type { SensorSetup } from '../../sensor/sensorSetup.ts';
import type { RunSession } from '../../session/index.ts';
import type { ConnectedSensor } from './connectedSensor.ts';

/** A connected sensor as the run's source; its setup is saved with the run for a reopened app. */
export function sensorLiveSource({ setup, bridge }: ConnectedSensor, runStartS?: number): SensorLiveSource {
  // A typed reading is due every interval; the sensor alarm waits for a second one to be missed.
  const silenceLimitMs = setup.kind === 'typed' ? 2 * setup.reminderEveryS * 1000 : undefined;
  return adaptReadingSource(bridge, { kind: setup.kind, label: bridge.label, clock: wallClockS, snapshot: setup, runStartS, silenceLimitMs });
}

const runStartS = (session: RunSession) => Date.parse(session.header.started_at) / 1000;

async function loadSetup() {
  return { ...(await import('../../sensor/sensorSetup.ts')), env: browserSensorEnvironment() };
}

/**
 * After the app reopened a run that had a sensor: reconnects by itself where the browser allows
 * (typed readings, or the one serial port getPorts() still grants) and returns null; otherwise
 * returns the saved setup, for the one-tap reconnect on the Watch screen.
 */
export async function resumeSensorRun(session: RunSession, saved: unknown): Promise<SensorSetup | null> {
  const { parseSensorSetup, reopenWithoutTap, env } = await loadSetup();
  const setup = parseSensorSetup(saved);
  if (!setup) return null;
  const bridge = await reopenWithoutTap(setup, env);
  if (!bridge) return setup;
  if (session.isEnded) {
    await bridge.stop();
    return null;
  }
  session.attachSource(sensorLiveSource({ setup, bridge }, runStartS(session)));
  return null;
}

/** The tap that reconnects a reopened run's sensor: a granted port, or the browser's chooser. */
export async function reconnectRestoredSensor(session: RunSession, setup: SensorSetup): Promise<void> {
  const { reconnectWithTap, env } = await loadSetup();
  const bridge = await reconnectWithTap(setup, env);
  session.attachSource(sensorLiveSource({ setup, bridge }, runStartS(session)));
}
