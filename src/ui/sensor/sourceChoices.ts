import type { SourceCapability } from '../../sensor/capabilities.ts';
import type { SensorKind, SerialRoute } from '../../sensor/sensorSetup.ts';

export type SourceChoiceId = SensorKind | 'demo';

export interface SourceChoice {
  id: SourceChoiceId;
  title: string;
  /** One line on what it is for. */
  detail: string;
  isAvailable: boolean;
  /** Why it can or cannot work in this browser, in plain words. */
  why: string;
  /** For Modbus and query-reply instruments: the serial route they would take here. */
  route?: SerialRoute;
}

function capability(capabilities: SourceCapability[], source: SourceCapability['source']): SourceCapability {
  return capabilities.find((c) => c.source === source) ?? { source, isAvailable: false, why: 'This browser does not offer it.' };
}

/** Every way to bring readings in, with what this browser allows, in the order a chemist tries them. */
export function sourceChoices(capabilities: SourceCapability[]): SourceChoice[] {
  const serial = capability(capabilities, 'serial');
  const usb = capability(capabilities, 'usb');
  const bluetooth = capability(capabilities, 'bluetooth');
  const typed = capability(capabilities, 'typed');
  const serialRoute: SerialRoute | undefined = serial.isAvailable ? 'serial' : usb.isAvailable ? 'usb' : undefined;
  const overSerial = (what: string): Pick<SourceChoice, 'isAvailable' | 'why' | 'route'> =>
    serialRoute
      ? { isAvailable: true, route: serialRoute, why: serialRoute === 'serial' ? `${what} through Web Serial.` : `${what} through USB; ${usb.why}` }
      : { isAvailable: false, why: `${what} needs a serial port: ${serial.why}` };
  return [
    { id: 'serial', title: 'Thermocouple board or meter (Web Serial)', detail: 'A board that prints one reading a line on a USB serial cable.', ...serial },
    { id: 'usb', title: 'USB board (WebUSB)', detail: 'For phones without Web Serial: boards with native USB serial.', ...usb },
    { id: 'bluetooth', title: 'Bluetooth thermometer', detail: 'Health Thermometer or Environmental Sensing devices.', ...bluetooth },
    { id: 'modbus', title: 'Temperature controller (Modbus RTU)', detail: 'Reads a register once a second.', ...overSerial('A controller on an RS-485 or USB adapter is read') },
    { id: 'polling', title: 'Bench instrument (query and reply)', detail: 'Sends a query string and reads the answer.', ...overSerial('An instrument on a serial cable is asked') },
    { id: 'typed', title: 'Type the readings in', detail: 'Read the thermometer by eye; a tone reminds you at each interval.', ...typed },
    { id: 'demo', title: 'Demo simulation', detail: 'A simulated still, to try the app without a sensor.', isAvailable: true, why: 'Always available.' },
  ];
}
