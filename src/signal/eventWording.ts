import { figuresFor, type Figures } from '../science/units/figures.ts';
import type { EventKind, EventReason } from './types.ts';

/**
 * What an alarm is about, for the alarm book and its screen (the app's run/alarmBook.ts uses
 * the same four words). Information (vapour, plateau) has none.
 */
export type AlarmCategory = 'change-receiver' | 'check-heat' | 'sensor-lost' | 'pot-low';

/** The one wording of a watcher event, spoken by the app and printed by `analyze`. */
export interface EventWording {
  /** null for information, shown and spoken once. */
  category: AlarmCategory | null;
  /** What happened, in a few words. */
  message: string;
  /** What to do (ISA-18.2: an alarm without a response is not an alarm). */
  action: string;
}

// Our own words. Where the work can hurt someone (a dry pot, heat lost, flooding) the action
// gives the usual caution and defers to the lab's own procedures.
const DEFER = "follow your lab's procedures";
const DRY_POT = `If the pot is nearly dry, stop heating: never distil to dryness (overheated residues, peroxides, cracked glass); ${DEFER}`;


/**
 * Words for a watcher event: `headC` the event's head temperature (for a plateau its level,
 * NaN for none), `receiver` the one to change to (breakthrough, cut) or collecting (vapour,
 * plateau), when a plan or the app knows it; temperatures on the reader's scale (`figures`,
 * degC by default).
 */
export function wordWatchEvent(kind: EventKind, headC: number, reason?: EventReason, receiver?: number, figures: Figures = figuresFor()): EventWording {
  const degrees = (c: number): string => (Number.isFinite(c) ? ` at ${figures.temperature(c)}` : '');
  const to = receiver === undefined ? 'the next receiver' : `receiver ${receiver}`;
  switch (kind) {
    case 'vapour':
      return {
        category: null,
        message: 'Vapour has reached the thermometer',
        action: receiver === undefined ? 'Set the rate to about a drop a second' : `Collect in receiver ${receiver}, about a drop a second`,
      };
    case 'plateau':
      if (reason === 'mixed') {
        return {
          category: null,
          message: `Steady${degrees(headC)}, where no component of the charge comes over nearly pure: a mixed fraction`,
          action: receiver === undefined ? 'Keep it apart from the main cuts' : `Keep collecting in receiver ${receiver}, apart from the main cuts`,
        };
      }
      return {
        category: null,
        message: `Steady${degrees(headC)}`,
        action: receiver === undefined ? 'Keep collecting' : `Keep collecting in receiver ${receiver}`,
      };
    case 'breakthrough':
      return { category: 'change-receiver', message: `Temperature rising off the plateau${degrees(headC)}`, action: `Change to ${to}` };
    case 'cut':
      if (reason === 'settled') {
        return { category: 'change-receiver', message: `Steady${degrees(headC)}, just short of the next main cut's planned window: that cut begins`, action: `Change to ${to}` };
      }
      return { category: 'change-receiver', message: `Planned cut reached${degrees(headC)}`, action: `Change to ${to}` };
    case 'stall':
      if (reason === 'no-vapour') {
        return {
          category: 'check-heat',
          message: 'Vapour is not reaching the head',
          action: `Check the heat, the insulation of the column and the joints (a leaking joint lets flammable vapour out); ${DEFER}`,
        };
      }
      if (reason === 'creeping') {
        return {
          category: 'check-heat',
          message: 'The head temperature is not settling',
          action: 'Turn the heat down a little: a slower rate separates better',
        };
      }
      // Falling away, or a reason this wording does not know: the cautious words.
      return {
        category: 'pot-low',
        message: 'The head temperature is falling away',
        action: `Check the heat: if it went off, find out why before turning it back on. ${DRY_POT}`,
      };
    case 'sensor-fault':
      if (reason === 'stuck') {
        return {
          category: 'sensor-lost',
          message: `Sensor problem: reading stuck${degrees(headC)}`,
          action: 'The value has not wavered at all, as a live sensor does: check the meter and its connection, and read the thermometer by eye meanwhile',
        };
      }
      if (reason === 'erratic') {
        return {
          category: 'sensor-lost',
          message: 'Sensor problem: readings jumping',
          action: `Check the thermocouple contact and cable. If liquid surges in the column it is flooding: turn the heat down and let it drain; ${DEFER}`,
        };
      }
      return {
        category: 'sensor-lost',
        message: reason === 'open-thermocouple' ? 'Sensor problem: open thermocouple' : 'Sensor problem: no valid readings',
        action: reason === 'open-thermocouple'
          ? 'Check the thermocouple wiring and connector; read the thermometer by eye meanwhile'
          : 'Check the sensor and its connection; read the thermometer by eye meanwhile',
      };
  }
}

/** The app's own alarm when the sensor sends nothing at all (no event from the watcher). */
export const sensorSilentWording: EventWording & { category: AlarmCategory } = {
  category: 'sensor-lost',
  message: 'No readings from the sensor',
  action: 'Check the cable or connection, then reconnect; read the thermometer by eye meanwhile',
};

/**
 * The watcher's alarm kinds (the issue scores vapour with them); a plateau is information.
 * The app speaks vapour as information too: it has no alarm category.
 */
export function isAlarmKind(kind: EventKind): boolean {
  return kind !== 'plateau';
}
