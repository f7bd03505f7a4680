import type { ButtonHTMLAttributes } from "react";

const variants = {
  primary: "bg-fin-600 text-white hover:bg-fin-700 disabled:bg-sand-500",
  secondary: "border border-fin-600 bg-white text-fin-600 hover:bg-sand-50 disabled:text-sand-500 disabled:border-sand-300",
  danger: "bg-stop-600 text-white hover:bg-stop-800 disabled:bg-sand-500",
  quiet: "text-fin-600 hover:bg-sand-200",
} as const;

export function buttonClass(variant: keyof typeof variants = "primary", extra = "") {
  return `inline-flex min-h-11 items-center no-underline hover:no-underline justify-center gap-2 rounded px-4 py-2 font-bold transition-colors disabled:cursor-not-allowed ${variants[variant]} ${extra}`;
}

export function Button({ variant = "primary", className = "", ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: keyof typeof variants }) {
  return <button type="button" className={buttonClass(variant, className)} {...props} />;
}
