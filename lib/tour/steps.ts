// The first-run tour: a few steps per role, each pointing at something the console shell renders.
// Pure data and helpers; components/shell/guided-tour.tsx shows them.
import { navTourId, SHELL_TARGETS, tourSelector } from "./targets";

export type TourStep = { target: string; title: string; body: string };
export type TourRole = "admin" | "engineer" | "reviewer" | "technician" | "viewer";

/** Fired on window to start the tour again (the account menu's "Show the tour again"). */
export const TOUR_START_EVENT = "roostline:tour-start";

const nav = (href: string) => tourSelector(navTourId(href));
const ACCOUNT = tourSelector(SHELL_TARGETS.accountMenu);

const SAFETY_NOTE =
  "Stall detection is a second line of defence, not a guarantee: a door can still trap a bird or a hand. Test the obstacle stop on site after every change, and follow local codes and licensed practice for powered doors and animal-welfare rules.";

const HELP: TourStep = {
  target: nav("/help"),
  title: "Help when a value puzzles you",
  body: "Every parameter and safety rule explained in plain words, with its unit, its limits and the caution that goes with it.",
};

const SHORTCUTS: TourStep = {
  target: ACCOUNT,
  title: "Shortcuts, and this tour again",
  body: "Press ? for the keyboard shortcuts, such as g then p for Profiles. Your account menu lists them too and can start this tour again.",
};

const STEPS: Record<TourRole, TourStep[]> = {
  engineer: [
    {
      target: nav("/profiles"),
      title: "Profiles are where you work",
      body: "Each door model has a base profile; overlays for a site or a single controller hold only the values that differ there. Every save is a revision you can compare with the one before.",
    },
    {
      target: nav("/profiles"),
      title: "The editor: Text or Fields",
      body: "Open a profile to edit it as a JSON document (Text) or one parameter at a time with units and limits (Fields). Problems lists schema issues and safety findings as you type. Ctrl+S saves.",
    },
    {
      target: nav("/profiles"),
      title: "Submit for review",
      body: "When a revision is ready, choose Submit for review (Ctrl+Enter). Someone other than you has to approve it, and a change to safety-relevant parameters needs two approvals unless your admin set another number.",
    },
    HELP,
    SHORTCUTS,
  ],
  reviewer: [
    {
      target: nav("/reviews"),
      title: "Your review queue",
      body: "Submitted revisions wait here until they are approved or sent back. Your own never appear: an author cannot approve their own change.",
    },
    {
      target: nav("/reviews"),
      title: "Compare before you decide",
      body: "A review opens on what changed against the previous revision, parameter by parameter, beside the schema checks and the safety findings. Comment on a parameter to ask the author about it.",
    },
    {
      target: nav("/reviews"),
      title: "Approve, or send it back",
      body: `Your decision applies to exactly the content on screen; a later revision needs a fresh review. Safety-relevant changes need two approvals from different reviewers unless your admin set another number. ${SAFETY_NOTE}`,
    },
    {
      target: nav("/audit"),
      title: "Who did what, and when",
      body: "Every submission, decision, release and token change is recorded in the audit log.",
    },
    HELP,
    SHORTCUTS,
  ],
  technician: [
    {
      target: nav("/sites"),
      title: "Sites come first",
      body: "Add each farm or house with its position and time zone. Sunrise and dusk there, and so the door times, follow from them.",
    },
    {
      target: nav("/controllers"),
      title: "Register controllers",
      body: "Register a controller by its serial, or import many at once from a CSV file. Each one gets a device token, shown only once, to load into the controller.",
    },
    {
      target: nav("/controllers"),
      title: "Calibrate on site, from a phone",
      body: `Open a controller on your phone at the door and upload the recorded run. Roostline plots it and suggests travel and stall values, which become a draft for an engineer to review. On a narrow screen the areas are behind the Menu button. ${SAFETY_NOTE}`,
    },
    {
      target: nav("/tools"),
      title: "Tools for the field",
      body: "Work out cord travel, stall thresholds, button debounce, sunrise and dusk, and whether a time signal reaches the site.",
    },
    HELP,
    SHORTCUTS,
  ],
  admin: [
    {
      target: nav("/admin/users"),
      title: "People and roles",
      body: "Invite colleagues and give each the role they need. Deactivating someone ends their sessions at once; the last active admin cannot be removed.",
    },
    {
      target: nav("/releases"),
      title: "Releases in stages",
      body: "Release an approved base profile from its profile page to a first share of its target, watch adoption here, then widen, pause or roll back. Start with doors someone can watch.",
    },
    {
      target: nav("/controllers"),
      title: "Device tokens",
      body: "A controller's page issues a new token or revokes it. Only a hash is stored, so a new token is shown once; a revoked controller can no longer download configurations.",
    },
    {
      target: nav("/admin/mail"),
      title: "Mail",
      body: "Invitations and review notices go out through an outbox. Anything that failed to send stays listed here with a retry.",
    },
    SHORTCUTS,
  ],
  viewer: [
    {
      target: nav("/"),
      title: "The overview",
      body: "What needs attention today across your sites and controllers, and how the fleet is doing.",
    },
    {
      target: nav("/profiles"),
      title: "Read every profile",
      body: "Door models, their parameters and each revision's history. Your role reads everything and changes nothing.",
    },
    {
      target: nav("/tools"),
      title: "Tools",
      body: "Calculators for cord travel, stall thresholds, button debounce, sunrise and dusk, and time-signal reception.",
    },
    HELP,
    SHORTCUTS,
  ],
};

/** The tour steps for a role; an unknown role gets none. */
export function tourSteps(role: string): TourStep[] {
  return Object.hasOwn(STEPS, role) ? [...STEPS[role as TourRole]] : [];
}

/** The localStorage key that remembers a person finished or dismissed the tour for a role. */
export function tourStorageKey(userId: string, role: string): string {
  return `roostline-tour:v1:${userId}:${role}`;
}

export type TourOutcome = "completed" | "dismissed";

/** Whether to start the tour by itself, given what localStorage holds under the tour key. */
export function shouldStartTour(stored: string | null): boolean {
  return stored !== "completed" && stored !== "dismissed";
}
