/** The checks before heat on, in our own words. A reminder, not a risk assessment. */
export const preHeatChecks: { id: string; text: string }[] = [
  { id: 'open', text: 'The apparatus is open to the air at the receiver end. Never heat a closed system.' },
  { id: 'boiling', text: 'Boiling stones or a stirrer bar are in the pot (added cold, never to hot liquid).' },
  { id: 'joints', text: 'Every joint is seated and clipped, and the glassware has no cracks or star marks.' },
  { id: 'coolant', text: 'Coolant runs into the lower condenser connection and out of the upper one.' },
  { id: 'peroxides', text: 'Any ether or other peroxide former in the charge has been tested for peroxides.' },
  { id: 'ignition', text: 'No flame, spark or hot surface near the vapour outlet or the receiver.' },
  { id: 'autoignition', text: 'The heat source stays below the autoignition temperature of every component.' },
  { id: 'hood', text: 'The fume hood is running, with the sash as low as the work allows.' },
];
