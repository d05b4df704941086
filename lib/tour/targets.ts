// The data-tour names the console shell renders, shared by the shell and the tour steps.

/** The data-tour name of a menu link: "nav-" and the path's segments, "nav-overview" for "/". */
export function navTourId(href: string): string {
  const segments = href.replace(/[?#].*$/, "").split("/").filter(Boolean);
  return segments.length === 0 ? "nav-overview" : `nav-${segments.join("-")}`;
}

/** A CSS selector for a data-tour name. */
export function tourSelector(id: string): string {
  return `[data-tour="${id}"]`;
}

/** The shell's own anchors beside the menu links (rendered by app/(console)/layout.tsx). */
export const SHELL_TARGETS = {
  accountMenu: "account-menu",
  // The phone-width menu button: steps fall back to it when their link is folded away.
  menuToggle: "menu-toggle",
} as const;
