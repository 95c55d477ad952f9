/**
 * The demo charge in words and numbers only, for screens that describe it before any run: no
 * compound data, so the library stays out of the app's first load.
 */
export const demoMixtureWords = {
  title: 'ethyl acetate from butyl acetate',
  components: ['ethyl acetate', 'n-butyl acetate'],
  /** Charge: 30 mL of each. */
  chargeMl: [30, 30],
} as const;
