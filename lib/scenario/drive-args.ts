/**
 * Arguments of the command-line driver (scenario-file.md):
 *   <scenario.json> [--set <id>] [--format csv|json]
 * Pure: returns what to do or one line saying what is wrong.
 */

export type OutputFormat = "csv" | "json";

export const DRIVE_USAGE =
  "usage: npm run --silent drive -- <scenario.json> [--set <id>] [--format csv|json]";

export type DriveArgs =
  | { kind: "run"; file: string; setId: string | null; format: OutputFormat }
  | { kind: "help" }
  | { kind: "error"; message: string };

const error = (message: string): DriveArgs => ({ kind: "error", message });

export function parseDriveArgs(argv: readonly string[]): DriveArgs {
  const positional: string[] = [];
  const options = new Map<string, string>();
  let onlyPositional = false;
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    if (onlyPositional || !arg.startsWith("-") || arg === "-") {
      positional.push(arg);
      continue;
    }
    if (arg === "--") {
      onlyPositional = true;
      continue;
    }
    if (arg === "--help" || arg === "-h") return { kind: "help" };
    const eq = arg.indexOf("=");
    const name = eq === -1 ? arg : arg.slice(0, eq);
    if (name !== "--set" && name !== "--format") {
      return error(`unknown option ${name}; ${DRIVE_USAGE}`);
    }
    let value: string | undefined;
    if (eq !== -1) value = arg.slice(eq + 1);
    else if (i + 1 < argv.length && !argv[i + 1].startsWith("--")) value = argv[++i];
    if (value === undefined || value === "") return error(`option ${name} needs a value`);
    if (options.has(name)) return error(`option ${name} given twice`);
    options.set(name, value);
  }
  if (positional.length === 0) return error(`missing the scenario file; ${DRIVE_USAGE}`);
  if (positional.length > 1) {
    return error(`expected one scenario file, got ${positional.length}: ${positional.join(" ")}`);
  }
  const format = options.get("--format") ?? "csv";
  if (format !== "csv" && format !== "json") {
    return error(`--format must be csv or json, got ${JSON.stringify(format)}`);
  }
  return { kind: "run", file: positional[0], setId: options.get("--set") ?? null, format };
}
