import { UsageError } from './command.ts';

export interface ParsedArgs {
  /** `--name value` and `--name=value`; a flag with no value is "true". */
  options: Map<string, string>;
  positional: string[];
}

/**
 * Splits arguments into options and positionals. `flags` names options that take no value.
 * Unknown options fail, so a typo never passes silently.
 */
export function parseArgs(args: string[], known: { values?: string[]; flags?: string[] }): ParsedArgs {
  const values = new Set(known.values ?? []);
  const flags = new Set([...(known.flags ?? []), 'help']);
  const options = new Map<string, string>();
  const positional: string[] = [];
  for (let i = 0; i < args.length; i++) {
    const arg = args[i]!;
    if (arg === '--') {
      positional.push(...args.slice(i + 1));
      break;
    }
    if (!arg.startsWith('--')) {
      positional.push(arg);
      continue;
    }
    const eq = arg.indexOf('=');
    const name = arg.slice(2, eq < 0 ? undefined : eq);
    if (flags.has(name)) {
      options.set(name, 'true');
    } else if (values.has(name)) {
      const value = eq >= 0 ? arg.slice(eq + 1) : args[++i];
      if (value === undefined || value === '') throw new UsageError(`--${name} needs a value`);
      options.set(name, value);
    } else {
      throw new UsageError(`unknown option --${name}`);
    }
  }
  return { options, positional };
}

/** A required option's value, or a usage error naming it. */
export function requireOption(parsed: ParsedArgs, name: string): string {
  const value = parsed.options.get(name);
  if (value === undefined) throw new UsageError(`--${name} is required`);
  return value;
}
