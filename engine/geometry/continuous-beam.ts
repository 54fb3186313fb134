/**
 * How a level beam continuous over its posts shares a load spread evenly along its length: each
 * post's reaction as a fraction of the whole load, from the three-moment equation (Clapeyron) on
 * rigid supports, constant EI, with the overhangs as cantilevers.
 *
 * Two posts: the beam is statically determinate and the shares are the tributary shares exactly
 * (statics). Three or more: unknown moments M1…Mn−2 over the interior posts from
 *   M(i−1) Li + 2 Mi (Li + Li+1) + M(i+1) Li+1 = −w (Li³ + Li+1³) / 4       (sagging +)
 * with the end-post moments set by the overhangs, M0 = −w a²/2; then each span's end shears
 * w L/2 ± (M right − M left)/L add up to each reaction [std: three-moment equation, any structural
 * analysis text]. Check values: two equal spans without overhang give 3/8, 10/8, 3/8 of w L; three
 * give 0.4, 1.1, 1.1, 0.4 w L (AISC Steel Construction Manual, beam diagrams for continuous beams
 * [memory]).
 *
 * Every array load (dead, snow and each wind case, its horizontal part and its moment about the
 * beam) is uniform along the beam, so one set of shares serves every load case.
 *
 * @example continuousBeamShares({ widthFt: 20, xFt: [-7.5, -2.5, 2.5, 7.5] }) // [0.2625, 0.2375, 0.2375, 0.2625]
 */
export function continuousBeamShares(a: { widthFt: number; xFt: number[] }): number[] {
  const n = a.xFt.length;
  const W = a.widthFt;
  const x = a.xFt;
  const left = x[0] + W / 2;
  const right = W / 2 - x[n - 1];
  if (n === 2) {
    // Statics: the resultant of the uniform load sits at mid-width (x = 0).
    const L = x[1] - x[0];
    const r1 = (W * (0 - x[0])) / L;
    return [(W - r1) / W, r1 / W];
  }
  const L: number[] = [];
  for (let i = 0; i < n - 1; i++) L.push(x[i + 1] - x[i]);
  const M = new Array<number>(n).fill(0);
  M[0] = -(left * left) / 2;
  M[n - 1] = -(right * right) / 2;
  // Tridiagonal system for M[1..n-2] (Thomas algorithm), w = 1.
  const m = n - 2;
  const sub = new Array<number>(m), diag = new Array<number>(m), sup = new Array<number>(m), rhs = new Array<number>(m);
  for (let k = 0; k < m; k++) {
    const Li = L[k], Lj = L[k + 1];
    sub[k] = Li; diag[k] = 2 * (Li + Lj); sup[k] = Lj;
    rhs[k] = -(Li ** 3 + Lj ** 3) / 4;
  }
  rhs[0] -= L[0] * M[0];
  rhs[m - 1] -= L[m] * M[n - 1];
  for (let k = 1; k < m; k++) {
    const f = sub[k] / diag[k - 1];
    diag[k] -= f * sup[k - 1];
    rhs[k] -= f * rhs[k - 1];
  }
  M[m] = rhs[m - 1] / diag[m - 1];
  for (let k = m - 2; k >= 0; k--) M[k + 1] = (rhs[k] - sup[k] * M[k + 2]) / diag[k];
  const R = new Array<number>(n).fill(0);
  R[0] += left;
  R[n - 1] += right;
  for (let i = 0; i < n - 1; i++) {
    const d = (M[i + 1] - M[i]) / L[i];
    R[i] += L[i] / 2 + d;
    R[i + 1] += L[i] / 2 - d;
  }
  for (let i = 0; i < n; i++) R[i] /= W;
  return R;
}
