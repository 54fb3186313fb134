/**
 * Command line: `npx tsx engine/cli.ts < design.json` prints the result as JSON;
 * `--text` prints a readable summary. Bad input: exit code 2 and the field errors as JSON on stderr.
 */
import { DesignInputError, EngineInputError } from "./errors";
import { sizeDesign } from "./size-design";
import { formatSummary } from "./summary";

async function readStdin(): Promise<string> {
  const chunks: Buffer[] = [];
  for await (const c of process.stdin) chunks.push(c as Buffer);
  return Buffer.concat(chunks).toString("utf8");
}

async function main(): Promise<number> {
  const text = process.argv.includes("--text");
  const raw = await readStdin();
  let input: unknown;
  try {
    input = JSON.parse(raw);
  } catch {
    process.stderr.write(JSON.stringify({ errors: [{ path: "(input)", message: "Input must be a JSON design object on standard input" }] }, null, 2) + "\n");
    return 2;
  }
  try {
    const result = sizeDesign(input);
    process.stdout.write((text ? formatSummary(result) : JSON.stringify(result, null, 2)) + "\n");
    return 0;
  } catch (e) {
    if (e instanceof DesignInputError || e instanceof EngineInputError) {
      process.stderr.write(JSON.stringify({ errors: e.issues }, null, 2) + "\n");
      return 2;
    }
    throw e;
  }
}

main().then((code) => process.exit(code));
