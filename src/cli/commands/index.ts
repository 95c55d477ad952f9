import type { Command } from '../command.ts';
import { analyze } from './analyze.ts';
import { bp } from './bp.ts';
import { bubble, dew } from './equilibriumCommand.ts';
import { plan } from './plan.ts';
import { simulate } from './simulate.ts';
import { pressure } from './pressure.ts';
import { tc } from './tc.ts';

// One line per command; each lives in its own file in this folder.
export const commands: Command[] = [
  analyze,
  bp,
  bubble,
  dew,
  pressure,
  plan,
  simulate,
  tc,
];
