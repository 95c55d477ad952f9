// The science core's public face: units, lab pressure, compounds, phase equilibrium, planning.
export * from './units/index.ts';
export * from './pressure/index.ts';
export * from './compounds/index.ts';
export * from './vle/index.ts';
export * from './plan/index.ts';
