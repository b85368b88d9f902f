// Plain-language readings of a chain's structure for the analysis panel: reducible chains,
// transient and absorbing states, periodic classes, slow mixing.
import type { ChainAnalysis } from '../../shared/markov';

/** A number for a sentence: up to three significant digits. */
export const approx = (x: number): string => String(Number(x.toPrecision(3)));

const quoted = (names: readonly string[]): string => names.map((n) => `'${n}'`).join(', ');

function reducible(chain: ChainAnalysis): string[] {
  const closed = chain.classes.closed;
  if (closed.length < 2) return [];
  return [
    `The chain is reducible: it has ${closed.length} closed groups of states (${closed.map((c) => `{${quoted(c)}}`).join(', ')}). ` +
      'Once the land enters a group it never leaves, so where it ends up depends on where it starts: there is no single set of long-run shares, and the shares within each group are given instead.',
  ];
}

function transient(chain: ChainAnalysis): string[] {
  const states = chain.classes.transient;
  if (states.length === 0) return [];
  const one = states.length === 1;
  return [`${quoted(states)} ${one ? 'is' : 'are'} transient: patches leave ${one ? 'it' : 'them'} for good sooner or later, so in the long run ${one ? 'it holds' : 'they hold'} no area.`];
}

function absorbing(chain: ChainAnalysis, yearsPerStep: number): string[] {
  if (chain.absorbing.length === 0) return [];
  const one = chain.absorbing.length === 1;
  const lines = [`${quoted(chain.absorbing)} ${one ? 'is an absorbing state' : 'are absorbing states'}: a patch that gets there stays for good.`];
  const absorption = chain.absorption;
  if (absorption) {
    const waits = chain.states.flatMap((s, i) =>
      chain.classes.transient.includes(s) ? [`from '${s}' ${approx(absorption.expectedSteps[i])} steps (${approx(absorption.expectedSteps[i] * yearsPerStep)} years)`] : [],
    );
    if (waits.length > 0) lines.push(`Expected time until a patch is absorbed: ${waits.join('; ')}.`);
  }
  return lines;
}

function periodic(chain: ChainAnalysis): string[] {
  return chain.period
    .filter((p) => p.period > 1)
    .map(
      (p) =>
        `The states ${quoted(p.class)} form a cycle of period ${p.period}: patches move round it in turn instead of settling, so the expected path keeps oscillating and never mixes` +
        (chain.stationary ? '; the long-run shares are averages over a cycle.' : '.'),
    );
}

function slow(chain: ChainAnalysis): string[] {
  const periodicChain = chain.period.some((p) => p.period > 1);
  if (!chain.stationary || periodicChain || chain.mixingTime !== null) return [];
  return [`The cover has not settled to within 1 % of its long-run shares after ${chain.mixingLimit.toLocaleString('en')} steps.`];
}

/** The readings of one stationary chain, each a full sentence; none for a regular (ergodic, aperiodic) chain. */
export function chainReadings(chain: ChainAnalysis, yearsPerStep: number): string[] {
  return [...reducible(chain), ...transient(chain), ...absorbing(chain, yearsPerStep), ...periodic(chain), ...slow(chain)];
}
