// Roostline's command line: `npm run roostline -- <command> [options] [--json]`.
import { COMMANDS } from "@/lib/cli/registry";
import { CliError } from "@/lib/cli/types";

function help(): string {
  const width = Math.max(...Object.keys(COMMANDS).map((c) => c.length), 4);
  const lines = Object.entries(COMMANDS).map(([name, c]) => `  ${name.padEnd(width)}  ${c.summary}`);
  return ["Usage: npm run roostline -- <command> [options] [--json]", "", "Commands:", ...lines, "", "`npm run roostline -- <command> --help` shows a command's options."].join("\n");
}

function main(argv: string[]): number {
  const json = argv.includes("--json");
  const args = argv.filter((a) => a !== "--json");
  const [name, ...rest] = args;
  if (!name || name === "help" || name === "--help" || name === "-h") {
    console.log(help());
    return 0;
  }
  const command = COMMANDS[name];
  if (!command) {
    console.error(`roostline: unknown command "${name}"; try: ${Object.keys(COMMANDS).join(", ")}`);
    return 1;
  }
  if (rest.includes("--help") || rest.includes("-h")) {
    console.log(command.usage);
    return 0;
  }
  try {
    const result = command.run(rest);
    console.log(json ? JSON.stringify(result.json, null, 2) : result.text);
    return 0;
  } catch (err) {
    if (err instanceof CliError || (err instanceof Error && (err as { code?: string }).code?.startsWith("ERR_PARSE_ARGS"))) {
      console.error(`roostline ${name}: ${err.message.split("\n")[0]}`);
      return 1;
    }
    throw err;
  }
}

process.exitCode = main(process.argv.slice(2));
