import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import { browserSensorEnvironment } from '../../sensor/browserEnvironment.ts';
import { describeCapabilities, fromNavigator, type SourceCapability } from '../../sensor/capabilities.ts';
import type { LineEnding } from '../../sensor/protocols/lineSplitter.ts';
import type { LineFormat } from '../../sensor/protocols/lineFormat.ts';
import type { ReadingSource } from '../../sensor/readingSource.ts';
import { createSensorBridge, type SensorEnvironment, type SensorSetup } from '../../sensor/sensorSetup.ts';
import type { SerialLineSource } from '../../sensor/serialLineSource.ts';
import { usbSerialLimits } from '../../sensor/usbSerialLimits.ts';
import type { ConnectedSensor } from './connectedSensor.ts';
import { LinePreview } from './LinePreview.tsx';
import { ReadingPreview } from './ReadingPreview.tsx';
import { BaudField, LineEndingField, ModbusForm, PollingForm, TypedForm, encodings, type ModbusFields, type PollingFields, type TypedFields } from './SetupForms.tsx';
import { sourceChoices, type SourceChoice } from './sourceChoices.ts';
import { figuresFor, type Figures } from '../../science/units/index.ts';
import { parseDecimal, type DecimalSeparator } from '../units/index.ts';
import './connect.css';

export interface ConnectSensorProps {
  onConnected(sensor: ConnectedSensor): void;
  onDemo(): void;
  onCancel(): void;
  /** Figures and typed numbers in the chemist's units and decimal mark (Settings). */
  figures?: Figures;
  /** The thermometer's scale and the reminder interval for typed readings, from Settings. */
  typedDefaults?: TypedFields;
  /** Tests and other browsers pass their own. */
  env?: SensorEnvironment;
  capabilities?: SourceCapability[];
}

const provisional: LineFormat = { field: { kind: 'bare' }, unit: 'C' };

function integer(text: string, what: string): number {
  const value = Number(text.trim());
  if (text.trim() === '' || !Number.isInteger(value)) throw new RangeError(`${what} must be a whole number`);
  return value;
}

/** The setup for the chosen source from the form fields; throws RangeError with plain words. */
function setupFrom(
  choice: SourceChoice,
  f: { baudRate: number; lineEnding: LineEnding; modbus: ModbusFields; polling: PollingFields; typed: TypedFields },
  decimalMark: DecimalSeparator,
): SensorSetup {
  switch (choice.id) {
    case 'serial':
    case 'usb':
      return { kind: choice.id, baudRate: f.baudRate, lineEnding: f.lineEnding, format: provisional };
    case 'modbus':
      return {
        kind: 'modbus',
        route: choice.route ?? 'serial',
        baudRate: f.baudRate,
        parity: f.modbus.parity,
        address: integer(f.modbus.address, 'the device address'),
        functionCode: f.modbus.functionCode === '4' ? 4 : 3,
        register: integer(f.modbus.register, 'the register'),
        encoding: encodings[f.modbus.encoding]!.encoding,
        unit: f.modbus.unit,
      };
    case 'polling': {
      let intervalS: number;
      try {
        intervalS = parseDecimal(f.polling.intervalS, decimalMark);
      } catch (error) {
        throw new RangeError(`the interval: ${error instanceof Error ? error.message : String(error)}`);
      }
      if (!(intervalS >= 0.1)) throw new RangeError('ask at most ten times a second (interval 0.1 s or more)');
      const name = f.polling.name.trim();
      return {
        kind: 'polling',
        route: choice.route ?? 'serial',
        baudRate: f.baudRate,
        query: f.polling.query,
        terminator: f.polling.terminator,
        intervalS,
        format: { field: name ? { kind: 'name', name } : { kind: 'bare' }, unit: 'C' },
      };
    }
    case 'bluetooth':
      return { kind: 'bluetooth' };
    case 'typed':
      return { kind: 'typed', unit: f.typed.unit, reminderEveryS: f.typed.reminderEveryS };
    case 'demo':
      throw new Error('the demo has no sensor');
  }
}

const connectLabel: Record<string, string> = {
  serial: 'Choose the serial port',
  usb: 'Choose the USB device',
  modbus: 'Choose the serial port',
  polling: 'Choose the serial port',
  bluetooth: 'Choose the thermometer',
  typed: 'Use typed readings',
};

/**
 * Connecting a sensor before heat on: which source (with what this browser allows, and why not
 * the rest), its settings, then a live look at what arrives before the chemist accepts it.
 */
export function ConnectSensor({ onConnected, onDemo, onCancel, figures = figuresFor(), typedDefaults, env, capabilities }: ConnectSensorProps) {
  const environment = useMemo(() => env ?? browserSensorEnvironment(), [env]);
  const choices = useMemo(
    () => sourceChoices(capabilities ?? describeCapabilities(fromNavigator(navigator, globalThis.isSecureContext))),
    [capabilities],
  );
  const [choice, setChoice] = useState<SourceChoice | null>(null);
  const [baudRate, setBaudRate] = useState(9600);
  const [lineEnding, setLineEnding] = useState<LineEnding>('any');
  const [modbus, setModbus] = useState<ModbusFields>({ address: '1', functionCode: '3', register: '0', encoding: 'int16-0.1', parity: 'none', unit: 'C' });
  const [polling, setPolling] = useState<PollingFields>({ query: '', terminator: 'crlf', intervalS: '1', name: '' });
  const [typed, setTyped] = useState<TypedFields>(typedDefaults ?? { unit: 'C', reminderEveryS: 60 });
  const [connected, setConnected] = useState<ConnectedSensor | null>(null);
  const [format, setFormat] = useState<LineFormat | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [isBusy, setBusy] = useState(false);

  // A bridge opened here but not accepted is released when the screen goes (another tab, Back).
  const unaccepted = useRef<ReadingSource | null>(null);
  useEffect(() => () => void unaccepted.current?.stop(), []);

  const disconnect = () => {
    unaccepted.current = null;
    void connected?.bridge.stop();
    setConnected(null);
    setFormat(null);
  };

  // Inside the tap: the browser opens its device chooser only from a user gesture.
  const connect = async (picked: SourceChoice) => {
    setError(null);
    setBusy(true);
    let bridge: ReadingSource | undefined;
    try {
      const setup = setupFrom(picked, { baudRate, lineEnding, modbus, polling, typed }, figures.style.decimalMark);
      bridge = await createSensorBridge(setup, environment);
      await bridge.start();
      const sensor = { setup, bridge };
      if (setup.kind === 'typed') onConnected(sensor);
      else {
        unaccepted.current = bridge;
        setConnected(sensor);
      }
    } catch (caught) {
      const message = caught instanceof Error ? caught.message : String(caught);
      setError(/NotFoundError|No port selected|cancel/i.test(message) ? 'No device was chosen. Plug it in and try again.' : `Could not connect: ${message}`);
    } finally {
      setBusy(false);
    }
  };

  const accept = () => {
    if (!connected) return;
    const { setup, bridge } = connected;
    unaccepted.current = null;
    onConnected({ bridge, setup: (setup.kind === 'serial' || setup.kind === 'usb') && format ? { ...setup, format } : setup });
  };

  if (!choice) {
    return (
      <section class="connect" aria-labelledby="connect-title">
        <h2 id="connect-title">Connect a sensor</h2>
        <ul class="source-choices">
          {choices.map((c) => (
            <li key={c.id}>
              <button type="button" class="source-choice" disabled={!c.isAvailable} onClick={() => (c.id === 'demo' ? onDemo() : setChoice(c))}>
                <strong>{c.title}</strong>
                <span>{c.detail}</span>
              </button>
              <p class="source-why" data-available={c.isAvailable}>{c.isAvailable || c.why.startsWith('Not ') ? c.why : `Not available here. ${c.why}`}</p>
            </li>
          ))}
        </ul>
        <button type="button" class="action action-quiet" onClick={onCancel}>Back</button>
      </section>
    );
  }

  const isSerialLine = choice.id === 'serial' || choice.id === 'usb';
  const usesSerial = isSerialLine || choice.id === 'modbus' || choice.id === 'polling';
  return (
    <section class="connect" aria-labelledby="connect-title">
      <h2 id="connect-title">{choice.title}</h2>
      {(choice.id === 'usb' || choice.route === 'usb') && <p class="hint">{usbSerialLimits}</p>}
      {!connected && (
        <form class="sensor-form" onSubmit={(e) => e.preventDefault()}>
          {usesSerial && <BaudField value={baudRate} onChange={setBaudRate} />}
          {isSerialLine && <LineEndingField value={lineEnding} onChange={setLineEnding} />}
          {choice.id === 'modbus' && <ModbusForm value={modbus} onChange={setModbus} />}
          {choice.id === 'polling' && <PollingForm value={polling} onChange={setPolling} />}
          {choice.id === 'typed' && <TypedForm value={typed} onChange={setTyped} />}
          {error && <p class="warning" role="alert">{error}</p>}
          <button type="button" class="action action-start" disabled={isBusy} onClick={() => void connect(choice)}>
            {connectLabel[choice.id]}
          </button>
          <button type="button" class="action action-quiet" onClick={() => setChoice(null)}>Back</button>
        </form>
      )}
      {connected && (
        <div class="sensor-preview">
          <p class="source-status" role="status">{connected.bridge.label}: {connected.bridge.status.message}</p>
          {isSerialLine ? (
            <LinePreview bridge={connected.bridge as SerialLineSource} onFormat={setFormat} figures={figures} />
          ) : (
            <ReadingPreview bridge={connected.bridge} figures={figures} />
          )}
          <button type="button" class="action action-start" disabled={isSerialLine && !format} onClick={accept}>
            Use this sensor
          </button>
          <button type="button" class="action action-quiet" onClick={disconnect}>Back</button>
        </div>
      )}
    </section>
  );
}
