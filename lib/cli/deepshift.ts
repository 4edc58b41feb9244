/**
 * Command-line entry point: `npm run -s deepshift -- <command> [options]`.
 * Each command lives in its own module and returns the process exit code; the same lib/ code serves the app.
 */
import { runExposureCommand } from "./exposure-command";
import { runLimitsCommand } from "./limits-command";

type Command = (args: string[]) => Promise<number>;

const commands: Record<string, { run: Command; summary: string }> = {
  exposure: { run: runExposureCommand, summary: "exposure --input LEDGER.json   exposure per data-quality period" },
  limits: {
    run: runLimitsCommand,
    summary: "limits --method fc|classical|bayes --observed N --background B --cl CL   Poisson upper limit",
  },
};

function usage(): string {
  return ["usage: deepshift <command> [options]", ...Object.values(commands).map((c) => `  ${c.summary}`)].join("\n");
}

async function main(argv: string[]): Promise<number> {
  const [name, ...rest] = argv;
  if (!name || name === "--help" || name === "-h") {
    process.stdout.write(usage() + "\n");
    return name ? 0 : 2;
  }
  const command = commands[name];
  if (!command) {
    process.stderr.write(`deepshift: unknown command "${name}"\n${usage()}\n`);
    return 2;
  }
  return command.run(rest);
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (err: unknown) => {
    process.stderr.write(`deepshift: ${err instanceof Error ? err.message : String(err)}\n`);
    process.exit(1);
  },
);
