"use client";
import { useEffect, useRef } from "react";
import type { ActionResult } from "@/lib/http/action";

/** A form ref that clears the form after its action reports success. */
export function useResetOnSuccess(state: ActionResult) {
  const ref = useRef<HTMLFormElement>(null);
  useEffect(() => {
    if (state.ok && state.message) ref.current?.reset();
  }, [state]);
  return ref;
}
