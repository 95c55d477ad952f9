import { useEffect, useState } from 'preact/hooks';
import { isSensorLiveSource } from '../../sensor/liveSourceAdapter.ts';
import type { ManualSource } from '../../sensor/manualSource.ts';
import type { SensorSetup } from '../../sensor/sensorSetup.ts';
import type { DecimalMark } from '../../science/index.ts';
import type { RunSession } from '../../session/index.ts';
import { reconnectRestoredSensor } from './sensorRun.ts';
import { TypedReadingPad } from './TypedReadingPad.tsx';
import './sensor.css';

interface SensorPanelProps {
  session: RunSession;
  /** A reopened run's sensor that still needs the chemist's tap. */
  restoredSetup: SensorSetup | null;
  onRestoredReconnected(): void;
  /** Sounds the reminder tone for typed readings. */
  onReminder(): void;
  /** The keypad's decimal key and display follow Settings. */
  decimalMark?: DecimalMark;
}

const isDown = (state: string) => state === 'lost' || state === 'failed' || state === 'stopped';

/** On the Watch screen: how the sensor is doing, one tap to reconnect it, the keypad for typed readings. */
export function SensorPanel({ session, restoredSetup, onRestoredReconnected, onReminder, decimalMark = '.' }: SensorPanelProps) {
  const source = isSensorLiveSource(session.source) ? session.source : null;
  const [status, setStatus] = useState(source?.status ?? null);
  const [error, setError] = useState<string | null>(null);
  const [isBusy, setBusy] = useState(false);
  useEffect(() => {
    setStatus(source?.status ?? null);
    return source?.onStatus(setStatus);
  }, [source]);
  if (session.isEnded) return null;

  // Inside the tap: the browser's chooser needs a user gesture.
  const reconnect = async () => {
    setError(null);
    setBusy(true);
    try {
      if (source) await source.reconnect();
      else if (restoredSetup) {
        await reconnectRestoredSensor(session, restoredSetup);
        onRestoredReconnected();
      }
    } catch (caught) {
      setError(`Could not reconnect: ${caught instanceof Error ? caught.message : String(caught)}`);
    } finally {
      setBusy(false);
    }
  };
  const reconnectButton = (
    <button type="button" class="action action-start" disabled={isBusy} onClick={() => void reconnect()}>Reconnect sensor</button>
  );

  if (!source) {
    if (!restoredSetup) return null;
    return (
      <div class="sensor-panel" data-state="lost">
        <p class="warning" role="status">The run was reopened: the sensor is not connected, so no readings are being recorded.</p>
        {reconnectButton}
        {error && <p class="warning" role="alert">{error}</p>}
      </div>
    );
  }

  const last = source.lastReading;
  const state = status?.state ?? source.status.state;
  return (
    <div class="sensor-panel" data-state={state}>
      {isDown(state) ? (
        <p class="warning" role="status" data-testid="sensor-status">Sensor {state === 'lost' ? 'lost' : 'not connected'}: {status?.message}</p>
      ) : (
        <p class="sensor-status" data-testid="sensor-status">{source.label}: {status?.message}</p>
      )}
      {!isDown(state) && last && !last.valid && <p class="hint">Last reading not valid: {last.reason}</p>}
      {isDown(state) && source.kind !== 'typed' && reconnectButton}
      {error && <p class="warning" role="alert">{error}</p>}
      {source.kind === 'typed' && <TypedReadingPad source={source.bridge as ManualSource} onReminder={onReminder} decimalMark={decimalMark} />}
    </div>
  );
}
