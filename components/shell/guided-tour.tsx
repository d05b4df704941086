"use client";
import { usePathname } from "next/navigation";
import { Popover } from "radix-ui";
import { useCallback, useEffect, useId, useLayoutEffect, useMemo, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { SHELL_TARGETS, tourSelector } from "@/lib/tour/targets";
import { shouldStartTour, TOUR_START_EVENT, tourStorageKey, tourSteps, type TourOutcome } from "@/lib/tour/steps";

type Measurable = { getBoundingClientRect: () => DOMRect };

const HIGHLIGHT = ["ring-2", "ring-straw-500", "ring-offset-2", "ring-offset-white", "dark:ring-offset-loam-900"];
// Late enough that the page has painted and settled, so the first step does not jump.
const START_DELAY_MS = 600;

// A closed <details> keeps its content laid out in some browsers, so client rects alone would
// find the folded phone menu's links.
function isShown(el: Element): el is HTMLElement {
  if (!(el instanceof HTMLElement)) return false;
  if (el.closest("details:not([open])") && !el.closest("summary")) return false;
  return typeof el.checkVisibility === "function" ? el.checkVisibility() : el.getClientRects().length > 0;
}

function visibleMatch(selector: string): HTMLElement | null {
  return [...document.querySelectorAll(selector)].find(isShown) ?? null;
}

function readStored(key: string): string | null | undefined {
  try {
    return localStorage.getItem(key);
  } catch {
    // Storage blocked: the tour could not remember being dismissed, so it never starts by itself.
    return undefined;
  }
}

/**
 * A short first-run tour of the console for the person's role. It starts by itself on the
 * overview, not on a page someone opened from a mailed link to do a job, and is remembered per
 * person and role once finished or dismissed. The account menu starts it again.
 */
export function GuidedTour({ userId, role }: { userId: string; role: string }) {
  const steps = useMemo(() => tourSteps(role), [role]);
  const storageKey = tourStorageKey(userId, role);
  const pathname = usePathname();
  const [index, setIndex] = useState<number | null>(null);
  const [anchor, setAnchor] = useState<{ el: HTMLElement | null; folded: boolean }>({ el: null, folded: false });
  const virtualRef = useRef<Measurable | null>(null);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const returnFocus = useRef<Element | null>(null);
  const autoStarted = useRef(false);
  const titleId = useId();
  const bodyId = useId();

  const start = useCallback(() => {
    if (steps.length === 0) return;
    returnFocus.current = document.activeElement;
    setIndex(0);
  }, [steps.length]);

  const finish = useCallback(
    (outcome: TourOutcome) => {
      try {
        localStorage.setItem(storageKey, outcome);
      } catch {
        // Nothing to remember it in; the tour simply ends.
      }
      setIndex(null);
    },
    [storageKey],
  );

  useEffect(() => {
    if (pathname !== "/" || autoStarted.current) return;
    const stored = readStored(storageKey);
    if (stored === undefined || !shouldStartTour(stored)) return;
    autoStarted.current = true;
    const timer = window.setTimeout(start, START_DELAY_MS);
    return () => window.clearTimeout(timer);
  }, [pathname, storageKey, start]);

  useEffect(() => {
    window.addEventListener(TOUR_START_EVENT, start);
    return () => window.removeEventListener(TOUR_START_EVENT, start);
  }, [start]);

  const step = index === null ? undefined : steps[index];

  useLayoutEffect(() => {
    if (!step) return;
    const direct = visibleMatch(step.target);
    // On a phone the menu links sit folded behind the Menu button; point there instead.
    const el = direct ?? visibleMatch(tourSelector(SHELL_TARGETS.menuToggle));
    // Radix measures whatever the virtual ref holds; with no target on screen, the top centre of the window.
    virtualRef.current = el ?? { getBoundingClientRect: () => new DOMRect(window.innerWidth / 2, 64, 0, 0) };
    setAnchor({ el, folded: !direct && !!el });
    if (!el) return;
    el.scrollIntoView({ block: "nearest" });
    el.classList.add(...HIGHLIGHT);
    return () => el.classList.remove(...HIGHLIGHT);
  }, [step, pathname]);

  useEffect(() => {
    if (step) headingRef.current?.focus();
  }, [step]);

  if (!step || index === null) return null;
  const last = index === steps.length - 1;
  const next = () => (last ? finish("completed") : setIndex(index + 1));
  const back = () => setIndex(Math.max(0, index - 1));
  const side = anchor.el?.closest("aside") ? "right" : "bottom";

  return (
    <Popover.Root open onOpenChange={(open) => !open && finish("dismissed")} modal={false}>
      <Popover.Anchor virtualRef={virtualRef} />
      <Popover.Portal>
        <Popover.Content
          side={side}
          align="start"
          sideOffset={10}
          collisionPadding={12}
          aria-labelledby={titleId}
          aria-describedby={bodyId}
          onOpenAutoFocus={(e) => {
            e.preventDefault();
            headingRef.current?.focus();
          }}
          onCloseAutoFocus={(e) => {
            e.preventDefault();
            const back = returnFocus.current;
            if (back instanceof HTMLElement && back.isConnected && isShown(back)) back.focus();
          }}
          // Tabbing past the last button should not end the tour; a click elsewhere or Esc does.
          onFocusOutside={(e) => e.preventDefault()}
          onKeyDown={(e) => {
            if (e.key === "ArrowRight") {
              e.preventDefault();
              next();
            } else if (e.key === "ArrowLeft") {
              e.preventDefault();
              back();
            }
          }}
          className="z-50 w-[min(20rem,calc(100vw-2rem))] rounded-lg border border-dusk-300 bg-white p-4 text-loam-900 shadow-xl dark:border-dusk-700 dark:bg-loam-900 dark:text-loam-100"
        >
          <p className="text-xs font-medium uppercase tracking-wide text-dusk-600 dark:text-dusk-300">
            Getting started · {index + 1} of {steps.length}
          </p>
          <h2 ref={headingRef} id={titleId} tabIndex={-1} className="mt-1 text-base font-semibold focus:outline-none">
            {step.title}
          </h2>
          <p id={bodyId} className="mt-1 text-sm text-loam-800 dark:text-loam-200">
            {step.body}
            {anchor.folded && " On this screen, open Menu to find it."}
          </p>
          <div className="mt-4 flex items-center justify-between gap-2">
            <Button variant="ghost" size="sm" onClick={() => finish("dismissed")}>
              Skip the tour
            </Button>
            <div className="flex gap-2">
              {index > 0 && (
                <Button variant="secondary" size="sm" onClick={back}>
                  Back
                </Button>
              )}
              <Button size="sm" onClick={next}>
                {last ? "Done" : "Next"}
              </Button>
            </div>
          </div>
          <Popover.Arrow className="fill-white dark:fill-loam-900" width={14} height={7} />
        </Popover.Content>
      </Popover.Portal>
    </Popover.Root>
  );
}
