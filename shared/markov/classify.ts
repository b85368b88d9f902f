/** Structure of a finite chain, by state index (Kemeny & Snell 1960, ch. II; Grinstead & Snell ch. 11). */
export type Classification = {
  /** Communicating classes (states reachable from each other), each sorted, in order of first state. */
  classes: number[][];
  /** The closed classes (no probability leaves them): the recurrent states of a finite chain. */
  closed: number[][];
  /** States in classes that are not closed. */
  transient: number[];
  /** States with p_ii = 1 (up to row rounding): closed classes of one state. */
  absorbing: number[];
  /** Period of each closed class, aligned with `closed`: gcd of the lengths of its return paths. */
  periods: number[];
};

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** reach[i][j]: j can be reached from i in zero or more steps (Warshall's transitive closure). */
function reachability(rows: readonly (readonly number[])[]): boolean[][] {
  const k = rows.length;
  const reach = rows.map((row, i) => row.map((p, j) => p > 0 || i === j));
  for (let m = 0; m < k; m++) {
    for (let i = 0; i < k; i++) {
      if (!reach[i][m]) continue;
      for (let j = 0; j < k; j++) if (reach[m][j]) reach[i][j] = true;
    }
  }
  return reach;
}

/**
 * Period of a class: breadth-first levels from one member, then the gcd of level[u] + 1 − level[v]
 * over the edges u → v inside the class (the standard level-graph characterisation of the period).
 */
function periodOf(rows: readonly (readonly number[])[], members: readonly number[]): number {
  const inClass = new Set(members);
  const level = new Map<number, number>([[members[0], 0]]);
  const queue = [members[0]];
  let period = 0;
  for (let head = 0; head < queue.length; head++) {
    const u = queue[head];
    const lu = level.get(u) as number;
    rows[u].forEach((p, v) => {
      if (p <= 0 || !inClass.has(v)) return;
      const lv = level.get(v);
      if (lv === undefined) {
        level.set(v, lu + 1);
        queue.push(v);
      } else {
        period = gcd(period, Math.abs(lu + 1 - lv));
      }
    });
  }
  return period;
}

/** Communicating classes, closed/transient/absorbing states and periods of a row-stochastic matrix. */
export function classify(rows: readonly (readonly number[])[]): Classification {
  const k = rows.length;
  const reach = reachability(rows);
  const assigned = new Array<boolean>(k).fill(false);
  const classes: number[][] = [];
  for (let i = 0; i < k; i++) {
    if (assigned[i]) continue;
    const members: number[] = [];
    for (let j = i; j < k; j++) {
      if (reach[i][j] && reach[j][i]) {
        members.push(j);
        assigned[j] = true;
      }
    }
    classes.push(members);
  }
  const isClosed = (members: number[]): boolean =>
    members.every((i) => rows[i].every((p, j) => p <= 0 || members.includes(j)));
  const closed = classes.filter(isClosed);
  return {
    classes,
    closed,
    transient: classes.filter((c) => !isClosed(c)).flat().sort((a, b) => a - b),
    absorbing: closed.filter((members) => members.length === 1).map(([i]) => i),
    periods: closed.map((members) => periodOf(rows, members)),
  };
}

/** Irreducible ("ergodic" in Grinstead & Snell's sense): one class, every state reaches every state. */
export function isErgodic(c: Classification): boolean {
  return c.classes.length === 1;
}
