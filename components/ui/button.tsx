import { clsx } from "clsx";
import type { ButtonHTMLAttributes } from "react";

const VARIANTS = {
  primary: "bg-ink-900 text-paper hover:bg-ink-800 disabled:bg-ink-400",
  accent: "bg-clay-600 text-white hover:bg-clay-700 disabled:bg-clay-300",
  secondary: "bg-paper-raised text-ink-800 ring-1 ring-inset ring-ink-200 hover:bg-ink-50 disabled:text-ink-300",
  ghost: "text-ink-700 hover:bg-ink-100 disabled:text-ink-300",
  danger: "bg-paper-raised text-flag-spike ring-1 ring-inset ring-flag-spike/30 hover:bg-flag-spike-soft",
} as const;

const SIZES = { sm: "h-8 px-3 text-sm", md: "h-10 px-4 text-sm", lg: "h-12 px-6 text-base" } as const;

export type ButtonProps = ButtonHTMLAttributes<HTMLButtonElement> & {
  variant?: keyof typeof VARIANTS;
  size?: keyof typeof SIZES;
};

export function buttonClass({
  variant = "primary",
  size = "md",
  className,
}: { variant?: keyof typeof VARIANTS; size?: keyof typeof SIZES; className?: string } = {}) {
  return clsx(
    "inline-flex items-center justify-center gap-2 rounded-lg font-medium transition-colors disabled:cursor-not-allowed",
    VARIANTS[variant],
    SIZES[size],
    className,
  );
}

export function Button({ variant, size, className, type = "button", ...props }: ButtonProps) {
  return <button type={type} className={buttonClass({ variant, size, className })} {...props} />;
}
