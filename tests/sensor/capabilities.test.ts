import { describe, expect, it } from 'vitest';
import { describeCapabilities, type BrowserFacts } from '../../src/sensor/capabilities.ts';

const chromeAndroid: BrowserFacts = {
  isSecureContext: true,
  hasSerial: false,
  hasUsb: true,
  hasBluetooth: true,
  userAgent: 'Mozilla/5.0 (Linux; Android 14; Pixel 7) AppleWebKit/537.36 (KHTML, like Gecko) Chrome/140.0 Mobile Safari/537.36',
};

const byName = (facts: BrowserFacts) => Object.fromEntries(describeCapabilities(facts).map((c) => [c.source, c]));

describe('describeCapabilities', () => {
  it('describeCapabilities offers USB and Bluetooth where Web Serial is missing, with the USB limits', () => {
    const c = byName(chromeAndroid);
    expect(c.serial?.isAvailable).toBe(false);
    expect(c.usb?.isAvailable).toBe(true);
    expect(c.usb?.why).toMatch(/CH340/);
    expect(c.bluetooth?.isAvailable).toBe(true);
    expect(c.typed?.isAvailable).toBe(true);
  });

  it('describeCapabilities says plainly why nothing but typing works on an iPhone', () => {
    const c = byName({ isSecureContext: true, hasSerial: false, hasUsb: false, hasBluetooth: false, userAgent: 'Mozilla/5.0 (iPhone; CPU iPhone OS 18_0 like Mac OS X) Safari/604.1' });
    expect(c.serial).toMatchObject({ isAvailable: false, why: expect.stringMatching(/iPhone/) });
    expect(c.bluetooth?.isAvailable).toBe(false);
    expect(c.typed?.isAvailable).toBe(true);
  });

  it('describeCapabilities blames an insecure page for missing device access', () => {
    const c = byName({ ...chromeAndroid, isSecureContext: false, hasSerial: true });
    expect(c.serial).toMatchObject({ isAvailable: false, why: expect.stringMatching(/https/) });
  });

  it('describeCapabilities prefers Web Serial over the USB route on desktop Chrome', () => {
    const c = byName({ ...chromeAndroid, hasSerial: true });
    expect(c.serial?.isAvailable).toBe(true);
    expect(c.usb).toMatchObject({ isAvailable: false, why: expect.stringMatching(/Not needed/) });
  });
});
