/**
 * A `navigator.serial` for the page, installed with addInitScript: one port whose open() creates
 * the streams and prints `head_c=...` lines on a timer, like a thermocouple board. The test
 * plays the cable through window.__board: unplug() errors the stream as Chrome does when the
 * device goes, plugIn() lets getPorts() offer the port again, setHeadC() changes what it prints.
 * With sessionStorage 'fake-board-unplugged' set, the page (after a reload) starts unplugged.
 */
export const fakeSerialScript = `
(() => {
  const encoder = new TextEncoder();
  const board = { isPluggedIn: sessionStorage.getItem('fake-board-unplugged') === null, opens: 0, headC: 78.25, lines: 0 };
  let controller = null;
  let timer = null;
  const stopPrinting = () => { clearInterval(timer); timer = null; };
  const port = {
    readable: null,
    writable: null,
    getInfo() { return { usbVendorId: 0x2341, usbProductId: 0x8036 }; },
    async open(options) {
      if (!board.isPluggedIn) throw new DOMException('Failed to open serial port.', 'NetworkError');
      if (this.readable) throw new DOMException('The port is already open.', 'InvalidStateError');
      board.opens += 1;
      board.baudRate = options.baudRate;
      this.readable = new ReadableStream({ start(c) { controller = c; }, cancel() { stopPrinting(); } });
      this.writable = new WritableStream({});
      timer = setInterval(() => {
        // Alternate the last digit so the value is never stuck (a stuck value is a sensor fault).
        const value = board.headC + (board.lines % 2) * 0.05;
        board.lines += 1;
        try { controller.enqueue(encoder.encode('head_c=' + value.toFixed(2) + '\\r\\n')); } catch { stopPrinting(); }
      }, 250);
    },
    async close() { stopPrinting(); this.readable = null; this.writable = null; },
  };
  board.unplug = () => {
    board.isPluggedIn = false;
    stopPrinting();
    controller?.error(new DOMException('The device has been lost.', 'NetworkError'));
    port.readable = null;
    port.writable = null;
  };
  board.plugIn = () => { board.isPluggedIn = true; };
  board.setHeadC = (value) => { board.headC = value; };
  window.__board = board;
  const serial = {
    async requestPort() { return port; },
    async getPorts() { return board.isPluggedIn ? [port] : []; },
    addEventListener() {},
    removeEventListener() {},
  };
  Object.defineProperty(navigator, 'serial', { value: serial, configurable: true });
})();
`;
