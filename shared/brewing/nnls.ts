/**
 * Non-negative least squares: minimise ‖A·x − b‖₂ subject to x ≥ 0, by the
 * active-set method of Lawson & Hanson ("Solving Least Squares Problems",
 * 1974, ch. 23, algorithm NNLS). Sized for the salt problem (a handful of
 * columns), so sub-problems use normal equations with pivoted elimination.
 */

export interface NnlsResult {
  x: number[];
  /** ‖A·x − b‖₂ */
  residualNorm: number;
  iterations: number;
}

function residual(a: readonly (readonly number[])[], x: readonly number[], b: readonly number[]): number[] {
  return b.map((bi, i) => bi - a[i]!.reduce((s, aij, j) => s + aij * x[j]!, 0));
}

function gradient(a: readonly (readonly number[])[], r: readonly number[], n: number): number[] {
  const w = new Array<number>(n).fill(0);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < n; j++) w[j]! += a[i]![j]! * r[i]!;
  return w;
}

/**
 * Unconstrained least squares on the columns in `passive`, others held at 0.
 * Normal equations (A_Pᵀ A_P) z = A_Pᵀ b by Gaussian elimination with partial
 * pivoting; a column with a vanishing pivot (dependent on earlier ones) gets 0.
 */
function solvePassive(
  a: readonly (readonly number[])[],
  b: readonly number[],
  passive: readonly number[],
  n: number,
): number[] {
  const k = passive.length;
  const m: number[][] = passive.map((p) => {
    const row = passive.map((q) => a.reduce((s, ai) => s + ai[p]! * ai[q]!, 0));
    row.push(a.reduce((s, ai, i) => s + ai[p]! * b[i]!, 0));
    return row;
  });
  const scale = Math.max(1e-300, ...m.map((row, i) => Math.abs(row[i]!)));
  const solution = new Array<number>(k).fill(0);
  const usable = new Array<boolean>(k).fill(true);
  for (let col = 0; col < k; col++) {
    let pivot = col;
    for (let r = col + 1; r < k; r++) if (Math.abs(m[r]![col]!) > Math.abs(m[pivot]![col]!)) pivot = r;
    if (Math.abs(m[pivot]![col]!) <= 1e-12 * scale) {
      usable[col] = false;
      continue;
    }
    [m[col], m[pivot]] = [m[pivot]!, m[col]!];
    for (let r = col + 1; r < k; r++) {
      const f = m[r]![col]! / m[col]![col]!;
      if (f !== 0) for (let c = col; c <= k; c++) m[r]![c]! -= f * m[col]![c]!;
    }
  }
  for (let col = k - 1; col >= 0; col--) {
    if (!usable[col]) continue;
    let s = m[col]![k]!;
    for (let c = col + 1; c < k; c++) s -= m[col]![c]! * solution[c]!;
    solution[col] = s / m[col]![col]!;
  }
  const z = new Array<number>(n).fill(0);
  passive.forEach((p, i) => {
    z[p] = solution[i]!;
  });
  return z;
}

const norm = (v: readonly number[]): number => Math.sqrt(v.reduce((s, x) => s + x * x, 0));

/**
 * Lawson–Hanson NNLS.
 * @param a m×n matrix as rows
 * @param b length-m target
 */
export function nnls(a: readonly (readonly number[])[], b: readonly number[]): NnlsResult {
  const n = a[0]?.length ?? 0;
  let x = new Array<number>(n).fill(0);
  const passive: number[] = [];
  const inPassive = new Array<boolean>(n).fill(false);
  const aNorm = Math.max(1, ...a.flat().map(Math.abs));
  const tol = 1e-10 * aNorm * Math.max(1, norm(b)) * Math.max(a.length, n);
  let iterations = 0;
  const maxIterations = 3 * n + 10;

  let w = gradient(a, residual(a, x, b), n);
  while (iterations < maxIterations) {
    let t = -1;
    for (let j = 0; j < n; j++) if (!inPassive[j] && w[j]! > tol && (t < 0 || w[j]! > w[t]!)) t = j;
    if (t < 0) break;
    iterations++;
    passive.push(t);
    inPassive[t] = true;
    for (;;) {
      const z = solvePassive(a, b, passive, n);
      if (passive.every((p) => z[p]! > 0)) {
        x = z;
        break;
      }
      // Step from x toward z until the first passive variable reaches zero.
      let alpha = 1;
      for (const p of passive) {
        if (z[p]! <= 0) alpha = Math.min(alpha, x[p]! / (x[p]! - z[p]!));
      }
      x = x.map((xi, j) => xi + alpha * (z[j]! - xi));
      for (let i = passive.length - 1; i >= 0; i--) {
        const p = passive[i]!;
        if (x[p]! <= 1e-14 * Math.max(1, ...x)) {
          x[p] = 0;
          inPassive[p] = false;
          passive.splice(i, 1);
        }
      }
      if (passive.length === 0) break;
    }
    w = gradient(a, residual(a, x, b), n);
  }
  return { x, residualNorm: norm(residual(a, x, b)), iterations };
}
