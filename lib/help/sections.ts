// The help pages, in reading order, for the index and the links between pages.

export type HelpSection = { href: string; title: string; summary: string };

export const HELP_SECTIONS: readonly HelpSection[] = [
  { href: "/help/parameters", title: "Parameters", summary: "Every parameter of a door's configuration: what it does, its unit, limits, default and whether a change needs the safety approvals." },
  { href: "/help/safety-rules", title: "Safety rules", summary: "The checks beyond the schema, by their RL- id: what each looks at, why, and what to do when it fires." },
  { href: "/help/reviews", title: "Reviews and approvals", summary: "Four eyes on every change, extra approvals for safety-relevant ones, decisions tied to the exact content, and acknowledging a warning." },
  { href: "/help/fleet", title: "Sites, controllers and releases", summary: "Registering controllers and their tokens, staged releases, what a controller does with a signed configuration, check-ins and drift." },
  { href: "/help/calibration", title: "Calibration on site", summary: "Recording a run on the door, the CSV it needs, what the suggested values mean and how they become a draft overlay." },
  { href: "/help/tools", title: "Tools and their sources", summary: "The drive, stall, debounce, sun and time-code calculators, the models behind them and where their numbers come from." },
];
