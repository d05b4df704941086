"use client";
import { useFormStatus } from "react-dom";
import { Button, type ButtonVariant } from "./button";

/** A submit button that shows progress while its form's action runs. */
export function SubmitButton({ children, pendingText, variant = "primary", size = "md" }: { children: React.ReactNode; pendingText?: string; variant?: ButtonVariant; size?: "sm" | "md" }) {
  const { pending } = useFormStatus();
  return (
    <Button type="submit" variant={variant} size={size} disabled={pending} aria-busy={pending}>
      {pending ? (pendingText ?? "Working…") : children}
    </Button>
  );
}
