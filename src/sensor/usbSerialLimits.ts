/**
 * Plain words for the chemist on what the USB route cannot reach, shown beside the button.
 */
export const usbSerialLimits =
  'Through USB the app can talk only to boards that present themselves as a standard USB serial ' +
  'device (CDC-ACM): most Arduino-compatible boards with native USB, Raspberry Pi Pico, many ' +
  'ESP32-S2/S3 boards. It cannot reach adapters that need their own driver: FTDI, Silicon Labs ' +
  'CP210x and WCH CH340 chips, found on many cheap boards and USB cables. On some phones the ' +
  'system itself holds the device ("Unable to claim interface"); then use Bluetooth or type the ' +
  'readings in.';
