/** Vibration (Android only, after a user gesture); silently absent elsewhere. */
export type Vibrate = (pattern: number[]) => boolean;

export const alarmVibration = [400, 150, 400, 150, 400];
export const infoVibration = [120];

export function vibrator(navigatorLike: { vibrate?: Vibrate } | undefined = globalThis.navigator): { isAvailable: boolean; vibrate: Vibrate } {
  const vibrate = navigatorLike?.vibrate?.bind(navigatorLike);
  return {
    isAvailable: typeof vibrate === 'function',
    vibrate: (pattern) => (vibrate ? vibrate(pattern) : false),
  };
}
