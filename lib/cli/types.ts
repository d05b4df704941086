import type { z } from "zod";
import { zodIssues } from "@/lib/http/validation";

/** What a command prints: `text` for people, `json` (one object) with --json. */
export type CliResult = { text: string; json: unknown };

/** Bad input on the command line: printed as one line on stderr, exit code 1. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "CliError";
  }
}

export type CliCommand = {
  /** One line for `roostline help`. */
  summary: string;
  /** Full usage text. */
  usage: string;
  /** Runs with the arguments after the command name (without --json). */
  run: (args: string[]) => CliResult;
};

/**
 * Validates parsed option values with a shared zod input schema, naming the option on failure
 * ("--spool-mm: must be greater than 0"). `flagOf` maps schema keys back to option names.
 */
export function parseCliInput<S extends z.ZodType>(schema: S, values: unknown, flagOf: (key: string) => string): z.infer<S> {
  const parsed = schema.safeParse(values);
  if (parsed.success) return parsed.data;
  const issue = zodIssues(parsed.error)[0]!;
  const key = issue.path.replace(/^\//, "").split("/")[0] ?? "";
  throw new CliError(key ? `${flagOf(key)}: ${issue.message}` : issue.message);
}

/** camelCase schema key → --kebab-case option name. */
export const kebabFlag = (key: string) => "--" + key.replace(/[A-Z]/g, (c) => "-" + c.toLowerCase());
