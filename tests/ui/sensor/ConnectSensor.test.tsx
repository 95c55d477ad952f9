// @vitest-environment happy-dom
import { render } from 'preact';
import { afterEach, describe, expect, it } from 'vitest';
import { describeCapabilities } from '../../../src/sensor/capabilities.ts';
import { ConnectSensor } from '../../../src/ui/sensor/ConnectSensor.tsx';
import type { ConnectedSensor } from '../../../src/ui/sensor/connectedSensor.ts';
import { FakeSerial } from '../../support/fakeSerial.ts';

let host: HTMLElement;
afterEach(() => {
  render(null, host);
  host.remove();
});

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const capabilities = describeCapabilities({ isSecureContext: true, hasSerial: true, hasUsb: false, hasBluetooth: false, userAgent: 'Chrome/140' });

function mount() {
  const serial = new FakeSerial();
  const connected: ConnectedSensor[] = [];
  host = document.createElement('div');
  document.body.append(host);
  render(
    <ConnectSensor env={{ serial, clock: () => Date.now() / 1000 }} capabilities={capabilities} onConnected={(c) => connected.push(c)} onDemo={() => {}} onCancel={() => {}} />,
    host,
  );
  const button = (text: RegExp) => {
    const found = [...host.querySelectorAll('button')].find((b) => text.test(b.textContent ?? ''));
    if (!found) throw new Error(`no button ${text}`);
    return found;
  };
  return { serial, connected, button };
}

describe('ConnectSensor', () => {
  it('says why an unavailable source cannot be used and keeps its button disabled', () => {
    const { button } = mount();
    expect(button(/Bluetooth thermometer/).disabled).toBe(true);
    expect(host.textContent).toMatch(/Bluetooth thermometers need Chrome on Android or a computer/);
    expect(button(/Web Serial/).disabled).toBe(false);
  });

  it('a serial board: the preview picks the head_c name and the setup handed over decodes it', async () => {
    const { serial, connected, button } = mount();
    button(/Web Serial/).click();
    await wait(0);
    button(/Choose the serial port/).click();
    await wait(20);
    const port = serial.ports[0]!;
    port.send('ms=1000 head_c=78.25 cj_c=22.1\r\nms=2000 head_c=78.50 cj_c=22.1\r\n');
    await wait(700);
    expect(host.querySelector('[data-testid="line-preview"]')?.textContent).toMatch(/head_c=78.50/);
    const checked = host.querySelector<HTMLInputElement>('input[type="radio"]:checked');
    expect(checked?.parentElement?.textContent).toMatch(/head_c: 78.50 °C/);
    button(/Use this sensor/).click();
    expect(connected).toHaveLength(1);
    expect(connected[0]!.setup).toMatchObject({ kind: 'serial', baudRate: 9600, format: { field: { kind: 'name', name: 'head_c' } } });
    render(null, host); // the flow gives way to the checklist: the accepted port stays open
    await wait(20);
    expect(port.isOpen).toBe(true);
    await connected[0]!.bridge.stop();
  });

  it('a port opened for the preview is closed when the screen goes without accepting it', async () => {
    const { serial, button } = mount();
    button(/Web Serial/).click();
    await wait(0);
    button(/Choose the serial port/).click();
    await wait(20);
    expect(serial.ports[0]!.isOpen).toBe(true);
    render(null, host);
    await wait(20);
    expect(serial.ports[0]!.isOpen).toBe(false);
  });

  it('a Modbus address outside 1-247 gets a plain message and no port is asked for', async () => {
    const { serial, button } = mount();
    button(/Modbus RTU/).click();
    await wait(0);
    const address = host.querySelector<HTMLInputElement>('input[inputmode="numeric"]')!;
    address.value = '0';
    address.dispatchEvent(new Event('input', { bubbles: true }));
    await wait(0);
    button(/Choose the serial port/).click();
    await wait(20);
    expect(host.querySelector('[role="alert"]')?.textContent).toMatch(/Modbus address must be 1 to 247/);
    expect(serial.requestCount).toBe(0);
  });

  it('typed readings are handed over at once, in the chosen unit', async () => {
    const { connected, button } = mount();
    button(/Type the readings in/).click();
    await wait(0);
    const unit = host.querySelector<HTMLSelectElement>('select')!;
    unit.value = 'F';
    unit.dispatchEvent(new Event('change', { bubbles: true }));
    await wait(0);
    button(/Use typed readings/).click();
    await wait(20);
    expect(connected[0]!.setup).toEqual({ kind: 'typed', unit: 'F', reminderEveryS: 60 });
    await connected[0]!.bridge.stop();
  });
});
