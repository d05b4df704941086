import { sha256Hex } from "@/lib/profiles/canonical";

/** How a one-time identifier (such as `reset-password:<token>`) is stored: only its SHA-256, never the token. */
export const storedIdentifier = (identifier: string): string => sha256Hex(identifier);
