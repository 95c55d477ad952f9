/** What the sensor page offers in this browser, and why the rest is missing. */
export interface SourceCapability {
  source: 'serial' | 'usb' | 'bluetooth' | 'typed';
  isAvailable: boolean;
  /** Plain words for the chemist. */
  why: string;
}

/** The facts the check reads; `fromNavigator` fills them in the page, tests pass their own. */
export interface BrowserFacts {
  isSecureContext: boolean;
  hasSerial: boolean;
  hasUsb: boolean;
  hasBluetooth: boolean;
  /** For the advice only ("on iPhone", "in Firefox"). */
  userAgent: string;
}

export function fromNavigator(nav: Navigator, isSecureContext: boolean): BrowserFacts {
  return {
    isSecureContext,
    hasSerial: 'serial' in nav,
    hasUsb: 'usb' in nav,
    hasBluetooth: 'bluetooth' in nav,
    userAgent: nav.userAgent,
  };
}

function browserHint(userAgent: string): string {
  if (/iPhone|iPad|iPod/.test(userAgent)) return 'Browsers on iPhone and iPad do not offer it';
  if (/Firefox\//.test(userAgent)) return 'Firefox does not offer it';
  if (/Safari\//.test(userAgent) && !/Chrome\/|Chromium\//.test(userAgent)) return 'Safari does not offer it';
  return 'This browser does not offer it';
}

/**
 * Says per source whether it can work here. Device access needs a secure page (https or
 * localhost) and a Chromium browser: Web Serial on desktop Chrome and Edge and recent Chrome on
 * Android, WebUSB and Web Bluetooth on Chrome for Android and desktop.
 */
export function describeCapabilities(facts: BrowserFacts): SourceCapability[] {
  const hint = browserHint(facts.userAgent);
  const insecure = 'The page is not served over https, so the browser keeps devices away from it. Open the app from its https address.';
  const device = (has: boolean, yes: string, no: string): { isAvailable: boolean; why: string } =>
    !facts.isSecureContext ? { isAvailable: false, why: insecure } : has ? { isAvailable: true, why: yes } : { isAvailable: false, why: `${hint}. ${no}` };
  return [
    {
      source: 'serial',
      ...device(
        facts.hasSerial,
        'A thermocouple board or meter on a USB serial cable can be read directly.',
        'Reading a USB serial cable directly needs Chrome or Edge on a computer, or a recent Chrome on Android.',
      ),
    },
    {
      source: 'usb',
      ...(facts.hasSerial && facts.isSecureContext
        ? { isAvailable: false, why: 'Not needed here: Web Serial reaches the same boards and more.' }
        : device(
            facts.hasUsb,
            'Boards that show up as a standard USB serial device (CDC-ACM) can be read over USB; adapters with FTDI, CP210x or CH340 chips cannot.',
            'USB access needs Chrome on Android or a computer.',
          )),
    },
    {
      source: 'bluetooth',
      ...device(
        facts.hasBluetooth,
        'A Bluetooth thermometer with the Health Thermometer or Environmental Sensing service can be read.',
        'Bluetooth thermometers need Chrome on Android or a computer.',
      ),
    },
    { source: 'typed', isAvailable: true, why: 'Readings can always be typed in, with a reminder at each interval.' },
  ];
}
