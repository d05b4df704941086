import { debounceCommand, stallCommand, travelCommand } from "./drive-commands";
import { sunCommand } from "./sun-command";
import { timecodeCommand } from "./timecode-command";
import type { CliCommand } from "./types";

// Each calculation registers its command here.
export const COMMANDS: Record<string, CliCommand> = {
  travel: travelCommand,
  stall: stallCommand,
  debounce: debounceCommand,
  sun: sunCommand,
  timecode: timecodeCommand,
};
