import type { AlarmKind } from '../run/index.ts';
import type { WatcherEvent } from './types.ts';

export interface AlarmWording {
  kind: AlarmKind;
  message: string;
  action: string;
}

const degrees = (c: number | null) => (c === null ? '' : ` at ${c.toFixed(1)} degrees`);

/**
 * Turns a watcher event into an alarm that names its action (ISA-18.2: an alarm without an
 * action is not an alarm), or into information, or nothing. Our own wording.
 */
export function wordEvent(event: WatcherEvent, nextReceiver: number): { alarm: AlarmWording } | { info: string } | null {
  switch (event.event) {
    case 'vapour':
      return { info: 'Vapour has reached the thermometer' };
    case 'plateau':
      return { info: `Steady${degrees(event.head_c)}` };
    case 'cut':
      return {
        alarm: {
          kind: 'change-receiver',
          message: `Planned cut reached${degrees(event.head_c)}`,
          action: `Change to receiver ${typeof event.receiver === 'number' ? event.receiver : nextReceiver}`,
        },
      };
    case 'breakthrough':
      return {
        alarm: {
          kind: 'change-receiver',
          message: `Temperature rising off the plateau${degrees(event.head_c)}`,
          action: `Change to receiver ${typeof event.receiver === 'number' ? event.receiver : nextReceiver}`,
        },
      };
    case 'stall': {
      const reason = String(event.reason ?? '');
      if (/fall|dry|lost/i.test(reason)) {
        return {
          alarm: {
            kind: 'pot-low',
            message: 'The head temperature is falling away',
            action: 'Check the heat. If the pot is nearly dry, stop heating: never distil to dryness',
          },
        };
      }
      return {
        alarm: {
          kind: 'check-heat',
          message: /no.?vapou?r|cold/i.test(reason) ? 'Vapour is not reaching the head' : 'The head temperature is not settling',
          action: 'Check the heat, the insulation of the column and the joints',
        },
      };
    }
    case 'sensor-fault':
      return {
        alarm: {
          kind: 'sensor-lost',
          message: `Sensor problem${event.reason ? `: ${String(event.reason).replace(/-/g, ' ')}` : ''}`,
          action: 'Check the thermocouple and its cable; read the thermometer by eye meanwhile',
        },
      };
    default:
      return null;
  }
}

export const sensorSilentWording: AlarmWording = {
  kind: 'sensor-lost',
  message: 'No readings from the sensor',
  action: 'Check the cable or connection, then reconnect',
};
