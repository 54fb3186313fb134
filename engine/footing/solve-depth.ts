/** Round a depth up to the next practical increment (in); tiny float noise does not bump it. */
export function roundUpIn(depthIn: number, incrementIn: number): number {
  return Math.ceil(depthIn / incrementIn - 1e-9) * incrementIn;
}
