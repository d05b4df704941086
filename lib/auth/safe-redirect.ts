/** A same-site path to return to after sign-in; anything else (other hosts, "//x", junk) becomes "/". */
export function safeNextPath(value: string | null | undefined): string {
  if (!value || !value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return "/";
  if (value.startsWith("/sign-in") || value.startsWith("/api/")) return "/";
  return value.length > 500 ? "/" : value;
}
