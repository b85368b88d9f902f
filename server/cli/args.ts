// Small, strict option parser shared by the CLI commands.
export class CliInputError extends Error {}

export type ParsedArgs = { options: Map<string, string>; flags: Set<string> };

/** Parses `--name value` options and bare `--flag` switches; `flagNames` lists the switches. */
export function parseArgs(argv: string[], flagNames: readonly string[]): ParsedArgs {
  const options = new Map<string, string>();
  const flags = new Set<string>();
  for (let i = 0; i < argv.length; i++) {
    const token = argv[i];
    if (!token.startsWith('--')) throw new CliInputError(`unexpected argument '${token}'`);
    const name = token.slice(2);
    if (flagNames.includes(name)) {
      flags.add(name);
      continue;
    }
    const value = argv[i + 1];
    if (value === undefined || value.startsWith('--')) {
      throw new CliInputError(`option --${name} needs a value`);
    }
    options.set(name, value);
    i++;
  }
  return { options, flags };
}

/** The value of a required option, or a CliInputError naming it. */
export function requireOption(args: ParsedArgs, name: string): string {
  const value = args.options.get(name);
  if (value === undefined) throw new CliInputError(`missing required option --${name}`);
  return value;
}

/** An option parsed as a positive integer, or a CliInputError saying what is wrong. */
export function integerOption(args: ParsedArgs, name: string, fallback: number): number {
  const raw = args.options.get(name);
  if (raw === undefined) return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < 0) {
    throw new CliInputError(`--${name} must be a whole number ≥ 0, got '${raw}'`);
  }
  return value;
}
