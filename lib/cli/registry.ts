import { debounceCommand, stallCommand, travelCommand } from "./drive-commands";
import type { CliCommand } from "./types";

// Each calculation registers its command here.
export const COMMANDS: Record<string, CliCommand> = {
  travel: travelCommand,
  stall: stallCommand,
  debounce: debounceCommand,
};
