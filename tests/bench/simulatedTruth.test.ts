import { describe, expect, it } from 'vitest';
import { heatLostStall } from '../../bench/simulatedTruth.ts';

describe('the column-simulator truth of a heat-lost run', () => {
  it('records the heat going off when the pot still holds liquid', () => {
    expect(heatLostStall(2640, null)).toEqual({ kind: 'stall', timeS: 2640, cause: 'heat-lost' });
    expect(heatLostStall(2640, 3100)).toEqual({ kind: 'stall', timeS: 2640, cause: 'heat-lost' });
  });

  it('records a dry pot, at its own time, when the pot ran dry before the heat went off', () => {
    // The head falls away as the pot runs dry; a stall dated to the later heat loss would score
    // the watcher's timely alarm as early (a false alarm and a miss).
    expect(heatLostStall(2640, 2511)).toEqual({ kind: 'stall', timeS: 2511, cause: 'pot-dry' });
  });
});
