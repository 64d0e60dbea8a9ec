/**
 * Command-line driver: `npm run --silent drive -- <scenario.json> [--set <id>] [--format csv|json]`.
 * All behaviour lives in lib/scenario/drive-command.ts; this file only binds it to the process.
 */
import { readFileSync } from "node:fs";
import { runPath } from "../lib/mechanics/driver";
import { EXIT_INTERNAL, runDriveCommand } from "../lib/scenario/drive-command";

// A reader that closes the pipe early (`| head`) is not an error of ours.
process.stdout.on("error", (err: NodeJS.ErrnoException) => {
  process.exit(err.code === "EPIPE" ? 0 : EXIT_INTERNAL);
});

try {
  process.exitCode = runDriveCommand(
    process.argv.slice(2),
    {
      readFile: (path) => readFileSync(path, "utf8"),
      stdout: (text) => void process.stdout.write(text),
      stderr: (line) => void process.stderr.write(line + "\n"),
    },
    runPath,
  );
} catch (err) {
  // runDriveCommand does not throw; this is the last guard against a stack trace.
  process.stderr.write(`internal error: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exitCode = EXIT_INTERNAL;
}
