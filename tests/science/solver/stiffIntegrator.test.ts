import { describe, expect, it } from 'vitest';
import { EVENT_FOUND, REACHED_STOP, StiffIntegrator } from '../../../src/science/solver/stiffIntegrator.ts';
import type { OdeEvents, OdeSystem } from '../../../src/science/solver/odeSystem.ts';

function runTo(integrator: StiffIntegrator, tEnd: number): void {
  while (integrator.advance(tEnd) !== REACHED_STOP) {
    // keep stepping
  }
}

// Robertson's chemical kinetics problem, the standard stiff test: Hairer & Wanner, Solving
// ODEs II, section IV.1 (from memory for the reference values at t = 40).
const robertson: OdeSystem = {
  size: 3,
  rhs(_t, y, dydt) {
    const [a, b, c] = [y[0]!, y[1]!, y[2]!];
    dydt[0] = -0.04 * a + 1e4 * b * c;
    dydt[1] = 0.04 * a - 1e4 * b * c - 3e7 * b * b;
    dydt[2] = 3e7 * b * b;
  },
};

describe('StiffIntegrator', () => {
  it('advance() integrates Robertson to t = 40 and keeps y1 + y2 + y3 = 1 to rounding', () => {
    const integrator = new StiffIntegrator(robertson, { relTol: 1e-6, absTol: 1e-10 });
    integrator.reset(0, [1, 0, 0]);
    runTo(integrator, 40);
    const y = integrator.y;
    expect(y[0]).toBeCloseTo(0.7158, 3);
    expect(y[1]! / 9.185e-6).toBeCloseTo(1, 2);
    expect(y[2]).toBeCloseTo(0.2842, 3);
    expect(Math.abs(y[0]! + y[1]! + y[2]! - 1)).toBeLessThan(1e-13);
    // An explicit method would need of order 1e5 steps here; the implicit one a few hundred.
    expect(integrator.stats.steps).toBeLessThan(2000);
  });

  it('advance() follows exp(-t) beside a mode decaying 1e6 times faster (exact solution)', () => {
    const system: OdeSystem = {
      size: 2,
      rhs(_t, y, dydt) {
        dydt[0] = -y[0]!;
        dydt[1] = -1e6 * (y[1]! - Math.cos(_t));
      },
    };
    const integrator = new StiffIntegrator(system, { relTol: 1e-7, absTol: 1e-12 });
    integrator.reset(0, [1, 0]);
    runTo(integrator, 3);
    // Error control is per step, so the global error is some tens of relTol.
    expect(integrator.y[0]! / Math.exp(-3)).toBeCloseTo(1, 4);
    // y1 tracks cos t with a lag of about 1e-6 s.
    expect(integrator.y[1]).toBeCloseTo(Math.cos(3), 5);
  });

  it('interpolate() lies on the solution inside a step', () => {
    const system: OdeSystem = { size: 1, rhs: (_t, y, dydt) => void (dydt[0] = -y[0]!) };
    const integrator = new StiffIntegrator(system, { relTol: 1e-8, absTol: 1e-12 });
    integrator.reset(0, [1]);
    integrator.advance(10);
    const middle = 0.5 * (integrator.tPrevious + integrator.t);
    const out = new Float64Array(1);
    integrator.interpolate(middle, out);
    expect(out[0]! / Math.exp(-middle)).toBeCloseTo(1, 6);
  });

  it('advance() stops just past the time an event function changes sign', () => {
    const system: OdeSystem = { size: 1, rhs: (_t, _y, dydt) => void (dydt[0] = 2) };
    const events: OdeEvents = { eventCount: 2, events: (_t, y, g) => { g[0] = y[0]! - 0.5; g[1] = y[0]! + 1; } };
    const integrator = new StiffIntegrator(system, { relTol: 1e-8, absTol: 1e-10, maxStep: 0.1 }, events);
    integrator.reset(0, [0]);
    let outcome = integrator.advance(10);
    while (outcome !== EVENT_FOUND && outcome !== REACHED_STOP) outcome = integrator.advance(10);
    expect(outcome).toBe(EVENT_FOUND);
    expect(integrator.t).toBeCloseTo(0.25, 8);
    expect(integrator.t).toBeGreaterThanOrEqual(0.25);
    expect(Array.from(integrator.eventFlags)).toEqual([1, 0]);
    runTo(integrator, 1);
    expect(integrator.y[0]).toBeCloseTo(2, 10);
  });

  it('rejects a NaN tolerance, a wrong absTol length and a stop time in the past', () => {
    expect(() => new StiffIntegrator(robertson, { relTol: Number.NaN, absTol: 1 })).toThrow(RangeError);
    expect(() => new StiffIntegrator(robertson, { relTol: 1e-6, absTol: new Float64Array(2) })).toThrow(RangeError);
    const integrator = new StiffIntegrator(robertson, { relTol: 1e-6, absTol: 1e-10 });
    integrator.reset(5, [1, 0, 0]);
    expect(() => integrator.advance(4)).toThrow(RangeError);
  });

  it('reset() copies the initial state and leaves the caller\'s array alone', () => {
    const y0 = Float64Array.from([1, 0, 0]);
    const integrator = new StiffIntegrator(robertson, { relTol: 1e-6, absTol: 1e-10 });
    integrator.reset(0, y0);
    runTo(integrator, 1);
    expect(Array.from(y0)).toEqual([1, 0, 0]);
  });
});
