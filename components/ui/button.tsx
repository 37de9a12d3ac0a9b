"use client";
import type { ButtonHTMLAttributes } from "react";
import { useFormStatus } from "react-dom";
import { buttonClass, type ButtonVariant } from "./button-class";

export { buttonClass, type ButtonVariant };

/** A submit button that shows it is working while the form's action runs. */
export function SubmitButton({
  children,
  pendingLabel = "Working…",
  variant = "primary",
  className = "",
  ...rest
}: ButtonHTMLAttributes<HTMLButtonElement> & { pendingLabel?: string; variant?: ButtonVariant }) {
  const { pending } = useFormStatus();
  return (
    <button type="submit" disabled={pending} className={buttonClass(variant, className)} {...rest}>
      {pending ? pendingLabel : children}
    </button>
  );
}
