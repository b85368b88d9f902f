// Eigenvalues of a small real matrix. mathjs's eigs (explicit QR with a Rayleigh shift) fails to
// converge on many non-symmetric stochastic matrices (complex pairs, ±λ pairs), so we use the
// classic route: reduction to upper Hessenberg form by stabilised elementary similarity
// transforms, then Francis double-shift QR (EISPACK elmhes + hqr; Press et al., Numerical
// Recipes, 3rd ed., §11.6–11.7).

export type Complex = { re: number; im: number };

const sign = (a: number, b: number): number => (b >= 0 ? Math.abs(a) : -Math.abs(a));

/** In place: upper Hessenberg form with the same eigenvalues (elmhes); entries below the subdiagonal zeroed. */
function toHessenberg(a: number[][]): void {
  const n = a.length;
  for (let m = 1; m < n - 1; m++) {
    let x = 0;
    let pivot = m;
    for (let j = m; j < n; j++) {
      if (Math.abs(a[j][m - 1]) > Math.abs(x)) {
        x = a[j][m - 1];
        pivot = j;
      }
    }
    if (pivot !== m) {
      for (let j = m - 1; j < n; j++) [a[pivot][j], a[m][j]] = [a[m][j], a[pivot][j]];
      for (let j = 0; j < n; j++) [a[j][pivot], a[j][m]] = [a[j][m], a[j][pivot]];
    }
    if (x === 0) continue;
    for (let i = m + 1; i < n; i++) {
      const y = a[i][m - 1] / x;
      if (y === 0) continue;
      a[i][m - 1] = 0;
      for (let j = m; j < n; j++) a[i][j] -= y * a[m][j];
      for (let j = 0; j < n; j++) a[j][m] += y * a[j][i];
    }
  }
}

/** All eigenvalues of a real square matrix (the input is not changed). */
export function eigenvalues(input: readonly (readonly number[])[]): Complex[] {
  const a = input.map((row) => [...row]);
  const n = a.length;
  toHessenberg(a);
  const out: Complex[] = new Array<Complex>(n);
  let anorm = 0;
  for (let i = 0; i < n; i++) for (let j = Math.max(i - 1, 0); j < n; j++) anorm += Math.abs(a[i][j]);
  const eps = Number.EPSILON;
  let nn = n - 1;
  let t = 0;
  let p = 0;
  let q = 0;
  let r = 0;
  while (nn >= 0) {
    let its = 0;
    let l: number;
    do {
      for (l = nn; l > 0; l--) {
        let s = Math.abs(a[l - 1][l - 1]) + Math.abs(a[l][l]);
        if (s === 0) s = anorm;
        if (Math.abs(a[l][l - 1]) <= eps * s) {
          a[l][l - 1] = 0;
          break;
        }
      }
      let x = a[nn][nn];
      if (l === nn) {
        out[nn--] = { re: x + t, im: 0 };
      } else {
        let y = a[nn - 1][nn - 1];
        let w = a[nn][nn - 1] * a[nn - 1][nn];
        if (l === nn - 1) {
          p = 0.5 * (y - x);
          q = p * p + w;
          let z = Math.sqrt(Math.abs(q));
          x += t;
          if (q >= 0) {
            z = p + sign(z, p);
            out[nn - 1] = { re: x + z, im: 0 };
            out[nn] = { re: z !== 0 ? x - w / z : x + z, im: 0 };
          } else {
            out[nn] = { re: x + p, im: -z };
            out[nn - 1] = { re: x + p, im: z };
          }
          nn -= 2;
        } else {
          if (its === 60) throw new Error('eigenvalues: QR iteration did not converge');
          if (its === 10 || its === 20) {
            // Exceptional shift.
            t += x;
            for (let i = 0; i <= nn; i++) a[i][i] -= x;
            const s = Math.abs(a[nn][nn - 1]) + Math.abs(a[nn - 1][nn - 2]);
            y = x = 0.75 * s;
            w = -0.4375 * s * s;
          }
          ++its;
          let m: number;
          let z = 0;
          for (m = nn - 2; m >= l; m--) {
            z = a[m][m];
            r = x - z;
            let s = y - z;
            p = (r * s - w) / a[m + 1][m] + a[m][m + 1];
            q = a[m + 1][m + 1] - z - r - s;
            r = a[m + 2][m + 1];
            s = Math.abs(p) + Math.abs(q) + Math.abs(r);
            p /= s;
            q /= s;
            r /= s;
            if (m === l) break;
            const u = Math.abs(a[m][m - 1]) * (Math.abs(q) + Math.abs(r));
            const v = Math.abs(p) * (Math.abs(a[m - 1][m - 1]) + Math.abs(z) + Math.abs(a[m + 1][m + 1]));
            if (u <= eps * v) break;
          }
          for (let i = m; i < nn - 1; i++) {
            a[i + 2][i] = 0;
            if (i !== m) a[i + 2][i - 1] = 0;
          }
          for (let k = m; k < nn; k++) {
            if (k !== m) {
              p = a[k][k - 1];
              q = a[k + 1][k - 1];
              r = k + 1 !== nn ? a[k + 2][k - 1] : 0;
              x = Math.abs(p) + Math.abs(q) + Math.abs(r);
              if (x !== 0) {
                p /= x;
                q /= x;
                r /= x;
              }
            }
            const s = sign(Math.sqrt(p * p + q * q + r * r), p);
            if (s === 0) continue;
            if (k === m) {
              if (l !== m) a[k][k - 1] = -a[k][k - 1];
            } else {
              a[k][k - 1] = -s * x;
            }
            p += s;
            x = p / s;
            y = q / s;
            z = r / s;
            q /= p;
            r /= p;
            for (let j = k; j <= nn; j++) {
              p = a[k][j] + q * a[k + 1][j];
              if (k + 1 !== nn) {
                p += r * a[k + 2][j];
                a[k + 2][j] -= p * z;
              }
              a[k + 1][j] -= p * y;
              a[k][j] -= p * x;
            }
            const mmin = nn < k + 3 ? nn : k + 3;
            for (let i = l; i <= mmin; i++) {
              p = x * a[i][k] + y * a[i][k + 1];
              if (k + 1 !== nn) {
                p += z * a[i][k + 2];
                a[i][k + 2] -= p * r;
              }
              a[i][k + 1] -= p * q;
              a[i][k] -= p;
            }
          }
        }
      }
    } while (l + 1 < nn);
  }
  return out;
}

/** Moduli of the eigenvalues, largest first. */
export function eigenvalueModuli(a: readonly (readonly number[])[]): number[] {
  return eigenvalues(a).map((v) => Math.hypot(v.re, v.im)).sort((x, y) => y - x);
}
