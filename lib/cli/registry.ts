import type { CliCommand } from "./types";

// Each calculation registers its command here.
export const COMMANDS: Record<string, CliCommand> = {};
