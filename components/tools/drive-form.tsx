"use client";

import { useMemo, useState, type ChangeEvent } from "react";
import type { z } from "zod";
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
