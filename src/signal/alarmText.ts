import type { EventKind, FaultReason, StallReason } from './types.ts';

// Each alarm names the action (ISA-18.2: an alarm without a response is not an alarm).
export function actionFor(kind: EventKind, reason: StallReason | FaultReason | undefined, receiver: number | undefined): string {
  const to = receiver === undefined ? 'the next receiver' : `receiver ${receiver}`;
  switch (kind) {
    case 'vapour': return receiver === undefined ? 'Vapour at the head: set the rate to about a drop a second' : `Vapour at the head: collect in receiver ${receiver}, about a drop a second`;
    case 'plateau': return receiver === undefined ? 'Steady head temperature: keep collecting' : `Steady head temperature: collecting in receiver ${receiver}`;
    case 'breakthrough': return `Temperature leaving the plateau: change to ${to}`;
    case 'cut': return `Planned cut reached: change to ${to}`;
    case 'stall':
      if (reason === 'no-vapour') return 'No vapour at the head yet: check the heat, insulate the column, check the joints';
      if (reason === 'creeping') return 'Head temperature creeping without settling: reduce the rate (heat) to improve the separation';
      return 'Head temperature falling away: check the heat; the pot may be nearly dry, do not distil to dryness';
    case 'sensor-fault':
      if (reason === 'open-thermocouple') return 'Thermocouple open or shorted: check its wiring and connector';
      if (reason === 'erratic') return 'Readings jumping: check the thermocouple contact and cable';
      return 'No valid readings: check the sensor and its connection; read the thermometer by hand';
  }
}

/** Information is shown once; the other kinds need an action. */
export function isAlarmKind(kind: EventKind): boolean {
  return kind !== 'plateau';
}
