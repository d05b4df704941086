"use client";

import { useMemo, useState, type ChangeEvent, type ReactNode } from "react";
import type { z } from "zod";
import { Panel } from "@/components/ui/surface";
import { fieldErrors } from "@/lib/drive/inputs";

/**
 * Form state for a tool: raw strings per field, parsed with the shared schema on every change so each
 * field's message sits next to it and the result updates live.
 */
export function useToolForm<S extends z.ZodType>(schema: S, initial: Record<string, string>) {
  const [values, setValues] = useState(initial);
  const parsed = useMemo(() => schema.safeParse(values), [schema, values]);
  const errors = parsed.success ? {} : fieldErrors(parsed.error);
  const field = (name: string) => ({
    name,
    value: values[name] ?? "",
    error: errors[name],
    onChange: (e: ChangeEvent<HTMLInputElement | HTMLSelectElement>) => {
      const value = e.target.value;
      setValues((v) => ({ ...v, [name]: value }));
    },
  });
  return { values, data: parsed.success ? (parsed.data as z.infer<S>) : null, errors, field };
}

/** Numeric inputs: the decimal keypad on phones, and no browser autofill of old values. */
export const NUMERIC_INPUT = { inputMode: "decimal" as const, autoComplete: "off" };

/** A tool page's two columns: the form in a panel on the left, the live results on the right. */
export function ToolLayout({ form, children }: { form: ReactNode; children: ReactNode }) {
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,22rem)_minmax(0,1fr)]">
      <Panel className="self-start">
        <form className="space-y-6" onSubmit={(e) => e.preventDefault()} noValidate>
          {form}
        </form>
      </Panel>
      <div className="space-y-6">{children}</div>
    </div>
  );
}
