import type { ButtonHTMLAttributes } from "react";

export type ButtonVariant = "primary" | "secondary" | "danger" | "ghost";

const VARIANTS: Record<ButtonVariant, string> = {
  primary: "bg-dusk-600 text-white hover:bg-dusk-700 dark:bg-dusk-500 dark:hover:bg-dusk-400",
  secondary:
    "border border-loam-200 bg-white text-loam-900 hover:bg-loam-100 dark:border-loam-800 dark:bg-loam-900 dark:text-loam-100 dark:hover:bg-loam-800",
  danger: "bg-ember-500 text-white hover:bg-ember-700",
  ghost: "text-loam-800 hover:bg-loam-100 dark:text-loam-100 dark:hover:bg-loam-800",
};

/** Class names for a button look, also used on links styled as buttons. */
export function buttonClass(variant: ButtonVariant = "primary", size: "sm" | "md" = "md"): string {
  const pad = size === "sm" ? "px-2.5 py-1 text-sm" : "px-3.5 py-2 text-sm";
  return `inline-flex items-center justify-center gap-1.5 whitespace-nowrap rounded-md font-medium no-underline hover:no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-60 ${pad} ${VARIANTS[variant]}`;
}

export function Button({
  variant = "primary",
  size = "md",
  className = "",
  type = "button",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: ButtonVariant; size?: "sm" | "md" }) {
  return <button type={type} className={`${buttonClass(variant, size)} ${className}`} {...props} />;
}
