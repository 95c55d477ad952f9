/** How liquid non-ideality is treated: Raoult's law, or original UNIFAC activity coefficients. */
export type ThermoModel = 'ideal' | 'unifac';
