/** A start-up problem the user can fix: printed as one line, exit code non-zero. */
export class StartupError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "StartupError";
  }
}

export function reportAndExit(error: unknown): never {
  if (error instanceof StartupError) {
    console.error(`pierwise: ${error.message}`);
  } else {
    console.error("pierwise: unexpected failure during start-up:", error);
  }
  process.exit(1);
}
