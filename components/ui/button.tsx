import type { ButtonHTMLAttributes } from "react";

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: "primary" | "secondary" | "danger";
  pending?: boolean;
}

const VARIANTS = {
  primary: "bg-verdigris text-white hover:bg-verdigris-dark",
  secondary: "border border-glaze-line bg-white text-ink hover:bg-glaze-deep",
  danger: "bg-kiln text-white hover:bg-kiln-dark",
};

export function Button({
  variant = "primary",
  pending,
  disabled,
  children,
  className = "",
  ...rest
}: ButtonProps) {
  return (
    <button
      disabled={disabled || pending}
      aria-busy={pending || undefined}
      className={`inline-flex items-center justify-center rounded-md px-4 py-2 text-sm font-medium disabled:opacity-60 ${VARIANTS[variant]} ${className}`}
      {...rest}
    >
      {children}
    </button>
  );
}
