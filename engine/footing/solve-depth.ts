/**
 * Smallest depth at which a check passes, by bisection: `margin(depthFt)` is capacity minus
 * demand and must not decrease with depth. Returns 0 when the check passes at zero depth and
 * `maxFt` (flagged) when it still fails there.
 */
export function solveDepthFt(margin: (depthFt: number) => number, maxFt = 60): { depthFt: number; converged: boolean } {
  if (margin(0) >= 0) return { depthFt: 0, converged: true };
  if (margin(maxFt) < 0) return { depthFt: maxFt, converged: false };
  let lo = 0;
  let hi = maxFt;
  while (hi - lo > 1e-7) {
    const mid = 0.5 * (lo + hi);
    if (margin(mid) >= 0) hi = mid;
    else lo = mid;
  }
  return { depthFt: hi, converged: true };
}

/** Round a depth up to the next practical increment (in); tiny float noise does not bump it. */
export function roundUpIn(depthIn: number, incrementIn: number): number {
  return Math.ceil(depthIn / incrementIn - 1e-9) * incrementIn;
}
