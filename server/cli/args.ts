// Small, strict option parser shared by the CLI commands.
import { readFileSync } from 'node:fs';
import { MarkovInputError } from '../../shared/markov/errors';
import { validateDistribution, type TransitionMatrix } from '../../shared/markov/matrix';
import { parseMatrixCsv } from '../../shared/markov/matrixCsv';

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

/** An option parsed as a finite number, or a CliInputError saying what is wrong. */
export function numberOption(args: ParsedArgs, name: string, fallback: number): number {
  const raw = args.options.get(name);
  if (raw === undefined) return fallback;
  const value = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(value)) {
    throw new CliInputError(`--${name} must be a number, got '${raw}'`);
  }
  return value;
}

/** A comma-separated list of numbers, or undefined when the option is absent. */
export function numberListOption(args: ParsedArgs, name: string): number[] | undefined {
  const raw = args.options.get(name);
  if (raw === undefined) return undefined;
  return raw.split(',').map((part, i) => {
    const value = Number(part.trim());
    if (part.trim() === '' || !Number.isFinite(value)) {
      throw new CliInputError(`--${name}: item ${i + 1} '${part}' is not a number (give e.g. 0.5,0.25,0.25)`);
    }
    return value;
  });
}

/** A comma-separated list of whole numbers ≥ 0, or undefined when absent. */
export function integerListOption(args: ParsedArgs, name: string): number[] | undefined {
  const values = numberListOption(args, name);
  values?.forEach((value, i) => {
    if (!Number.isInteger(value) || value < 0) {
      throw new CliInputError(`--${name}: item ${i + 1} '${value}' must be a whole number ≥ 0`);
    }
  });
  return values;
}

/** One of a fixed set of values. */
export function choiceOption<T extends string>(args: ParsedArgs, name: string, choices: readonly T[], fallback: T): T {
  const raw = args.options.get(name);
  if (raw === undefined) return fallback;
  const found = choices.find((choice) => choice === raw);
  if (found === undefined) throw new CliInputError(`--${name} must be one of ${choices.join(', ')}, got '${raw}'`);
  return found;
}

/** Runs `read`, turning the engine's input errors into one-line CLI errors prefixed with `where`. */
export function withInputErrors<T>(where: string, read: () => T): T {
  try {
    return read();
  } catch (err) {
    if (err instanceof MarkovInputError) throw new CliInputError(`${where}: ${err.message}`);
    throw err;
  }
}

/** The text of a file named by a required option, or a CliInputError naming option and file. */
export function readFileOption(args: ParsedArgs, name: string): { path: string; text: string } {
  const path = requireOption(args, name);
  try {
    return { path, text: readFileSync(path, 'utf8') };
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code ?? 'unreadable';
    throw new CliInputError(`--${name} ${path}: cannot read the file (${code})`);
  }
}

/** A plain-text table: columns padded, numbers right-aligned. */
export function formatTable(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, c) => Math.max(h.length, ...rows.map((row) => row[c].length)));
  const numeric = (text: string): boolean => /^[-+]?[\d.,e∞+-]+%?$/.test(text);
  const line = (cells: readonly string[]): string =>
    cells.map((cell, c) => (c > 0 && numeric(cell) ? cell.padStart(widths[c]) : cell.padEnd(widths[c]))).join('  ').trimEnd();
  return [line(header), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

/** A number for a table: fixed decimals, ∞ for Infinity, '—' for null or NaN. */
export function formatNumber(value: number | null, digits = 4): string {
  if (value === null || Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return '∞';
  return value.toFixed(digits);
}

/** The matrix named by --matrix, read with --orientation rows|columns and the --normalise switch. */
export function readMatrixOption(args: ParsedArgs): TransitionMatrix {
  const { path, text } = readFileOption(args, 'matrix');
  const orientation = choiceOption(args, 'orientation', ['rows', 'columns'] as const, 'rows');
  return withInputErrors(path, () => parseMatrixCsv(text, { orientation, normalise: args.flags.has('normalise') }));
}

/** Start shares from --initial (validated against the states), or undefined when absent. */
export function readInitialOption(args: ParsedArgs, states: readonly string[]): number[] | undefined {
  const shares = numberListOption(args, 'initial');
  return shares && withInputErrors('--initial', () => validateDistribution(shares, states, 'the start distribution'));
}
