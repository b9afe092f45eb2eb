/**
 * Householder QR for small dense least-squares problems (a few parameters, up to a few hundred
 * rows). Used by the Levenberg–Marquardt fitter: solving the damped step through QR of the
 * augmented matrix avoids squaring the condition number the way the normal equations JᵀJ do,
 * which matters on ill-conditioned fits such as NIST Kirby2 or Thurber. (Common practice; this is
 * how MINPACK's lmpar solves the step.)
 */

export interface QrResult {
  /** Upper-triangular n×n factor R (row-major). */
  r: number[][];
  /** Qᵀb, length m: the first n entries lie in the column space, the rest are orthogonal to it. */
  qtb: number[];
  /** Least-squares solution of A x ≈ b, or null when R has a (numerically) zero diagonal. */
  x: number[] | null;
}

/**
 * Least-squares solve of A x ≈ b by Householder QR. `a` is m×n row-major with m ≥ n.
 * A diagonal entry of R below 1e-13 × the largest one counts as zero (rank deficiency).
 */
export function qrLeastSquares(a: readonly (readonly number[])[], b: readonly number[]): QrResult {
  const m = a.length;
  const n = m === 0 ? 0 : (a[0]?.length ?? 0);
  if (m < n)
    throw new RangeError(`qrLeastSquares needs at least as many rows (${m}) as columns (${n})`);
  // Column-major working copy: cols[j][i] = a[i][j].
  const cols: Float64Array[] = [];
  for (let j = 0; j < n; j++) {
    const col = new Float64Array(m);
    for (let i = 0; i < m; i++) col[i] = a[i]?.[j] ?? 0;
    cols.push(col);
  }
  const qtb = Float64Array.from(b);
  const v = new Float64Array(m);
  for (let k = 0; k < n; k++) {
    const ck = cols[k] as Float64Array;
    let norm = 0;
    for (let i = k; i < m; i++) norm = Math.hypot(norm, ck[i] as number);
    if (norm === 0) continue;
    const akk = ck[k] as number;
    const alpha = akk > 0 ? -norm : norm;
    // v = x − alpha·e1, then H = I − 2 v vᵀ / (vᵀv).
    let vv = 0;
    for (let i = k; i < m; i++) {
      const vi = (ck[i] as number) - (i === k ? alpha : 0);
      v[i] = vi;
      vv += vi * vi;
    }
    if (vv === 0) continue;
    const reflect = (target: Float64Array): void => {
      let dot = 0;
      for (let i = k; i < m; i++) dot += (v[i] as number) * (target[i] as number);
      const f = (2 * dot) / vv;
      for (let i = k; i < m; i++) target[i] = (target[i] as number) - f * (v[i] as number);
    };
    for (let j = k; j < n; j++) reflect(cols[j] as Float64Array);
    reflect(qtb);
  }
  const r: number[][] = [];
  for (let i = 0; i < n; i++) {
    const row: number[] = [];
    for (let j = 0; j < n; j++) row.push(j >= i ? ((cols[j] as Float64Array)[i] as number) : 0);
    r.push(row);
  }
  return { r, qtb: Array.from(qtb), x: backSubstitute(r, Array.from(qtb.subarray(0, n))) };
}

function diagonalIsSingular(r: readonly (readonly number[])[]): boolean {
  let largest = 0;
  for (let i = 0; i < r.length; i++) largest = Math.max(largest, Math.abs(r[i]?.[i] ?? 0));
  if (largest === 0) return true;
  return r.some((row, i) => Math.abs(row[i] ?? 0) <= 1e-13 * largest);
}

/** Solve R x = y for upper-triangular R; null when R is numerically singular. */
export function backSubstitute(
  r: readonly (readonly number[])[],
  y: readonly number[],
): number[] | null {
  if (diagonalIsSingular(r)) return null;
  const n = r.length;
  const x = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    const row = r[i] as readonly number[];
    let s = y[i] ?? 0;
    for (let j = i + 1; j < n; j++) s -= (row[j] as number) * (x[j] as number);
    x[i] = s / (row[i] as number);
  }
  return x;
}

/** (RᵀR)⁻¹ = R⁻¹R⁻ᵀ for upper-triangular R; null when R is numerically singular. */
export function inverseOfRtR(r: readonly (readonly number[])[]): number[][] | null {
  if (diagonalIsSingular(r)) return null;
  const n = r.length;
  // Columns of R⁻¹ by back substitution against unit vectors.
  const rInv: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let k = 0; k < n; k++) {
    const e = new Array<number>(n).fill(0);
    e[k] = 1;
    const col = backSubstitute(r, e);
    if (col === null) return null;
    for (let i = 0; i < n; i++) (rInv[i] as number[])[k] = col[i] as number;
  }
  const out: number[][] = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      let s = 0;
      for (let k = 0; k < n; k++)
        s += ((rInv[i] as number[])[k] as number) * ((rInv[j] as number[])[k] as number);
      (out[i] as number[])[j] = s;
    }
  }
  return out;
}
