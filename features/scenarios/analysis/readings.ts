import type { ChainAnalysisJson } from '@/shared/schemas';

const list = (names: readonly string[]): string => {
  if (names.length <= 1) return names.join('');
  return `${names.slice(0, -1).join(', ')} and ${names[names.length - 1]}`;
};

const group = (names: readonly string[]): string => (names.length === 1 ? names[0] : `{${names.join(', ')}}`);

/** The structure of a chain in plain words: what settles, what is left, what never settles. */
export function chainReadings(chain: ChainAnalysisJson): string[] {
  const out: string[] = [];
  const { closed, transient } = chain.classes;
  if (closed.length > 1) {
    out.push(
      `Several closed groups of states: ${list(closed.map(group))}. Once cover is inside one of them it never leaves, so ` +
        'there is no single long-run share: where the land ends up depends on where it starts. The shares each group settles to are listed below.',
    );
  } else if (transient.length === 0 && chain.period.every((p) => p.period === 1)) {
    out.push('Every state can reach every other and the shares settle to one long-run mix, whatever the start cover.');
  }
  if (chain.absorbing.length > 0) {
    out.push(`${list(chain.absorbing)} ${chain.absorbing.length === 1 ? 'is' : 'are'} absorbing: a patch that gets there stays there (chance of staying 1).`);
  }
  if (transient.length > 0) {
    out.push(`${list(transient)} ${transient.length === 1 ? 'is' : 'are'} transient: cover leaves and does not come back, so in the long run ${transient.length === 1 ? 'it holds' : 'they hold'} 0 %.`);
  }
  chain.period
    .filter((p) => p.period > 1)
    .forEach((p) =>
      out.push(
        `${group(p.class)} is periodic with period ${p.period}: shares keep cycling every ${p.period} steps instead of settling. ` +
          'The long-run share is the average over a cycle, and there is no mixing time.',
      ),
    );
  if (chain.stationary && chain.mixingTime === null && chain.period.every((p) => p.period === 1)) {
    out.push(`The shares do not come within 1 % of the long-run mix within ${chain.mixingLimit.toLocaleString('en-US')} steps.`);
  }
  return out;
}
