import { describe, expect, it } from 'vitest';
import { describeCapabilities } from '../../../src/sensor/capabilities.ts';
import { sourceChoices } from '../../../src/ui/sensor/sourceChoices.ts';

const desktopChrome = 'Mozilla/5.0 (X11; Linux x86_64) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/140.0.0.0 Safari/537.36';
const iphone = 'Mozilla/5.0 (iPhone; CPU iPhone OS 18_0 like Mac OS X) AppleWebKit/605.1.15 (KHTML, like Gecko) Version/18.0 Mobile/15E148 Safari/604.1';
const byId = (choices: ReturnType<typeof sourceChoices>) => Object.fromEntries(choices.map((c) => [c.id, c]));

describe('sourceChoices', () => {
  it('offers all seven ways in, with Modbus and query-reply over Web Serial where it exists', () => {
    const choices = byId(sourceChoices(describeCapabilities({ isSecureContext: true, hasSerial: true, hasUsb: true, hasBluetooth: true, userAgent: desktopChrome })));
    expect(Object.keys(choices)).toEqual(['serial', 'usb', 'bluetooth', 'modbus', 'polling', 'typed', 'demo']);
    expect(choices.serial!.isAvailable).toBe(true);
    expect(choices.usb!.isAvailable).toBe(false);
    expect(choices.usb!.why).toMatch(/Not needed here/);
    expect(choices.modbus).toMatchObject({ isAvailable: true, route: 'serial' });
  });

  it('routes Modbus and query-reply over USB where only WebUSB exists (Android without Web Serial)', () => {
    const choices = byId(sourceChoices(describeCapabilities({ isSecureContext: true, hasSerial: false, hasUsb: true, hasBluetooth: true, userAgent: desktopChrome })));
    expect(choices.usb!.isAvailable).toBe(true);
    expect(choices.polling).toMatchObject({ isAvailable: true, route: 'usb' });
    expect(choices.polling!.why).toMatch(/CP210x/);
  });

  it('on an iPhone leaves typed readings and the demo, and says why the rest is missing', () => {
    const choices = byId(sourceChoices(describeCapabilities({ isSecureContext: true, hasSerial: false, hasUsb: false, hasBluetooth: false, userAgent: iphone })));
    const available = Object.values(choices).filter((c) => c.isAvailable).map((c) => c.id);
    expect(available).toEqual(['typed', 'demo']);
    expect(choices.serial!.why).toMatch(/iPhone/);
    expect(choices.modbus!.why).toMatch(/needs a serial port/);
    expect(choices.modbus!.route).toBeUndefined();
  });
});
