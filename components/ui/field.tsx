"use client";
import type { InputHTMLAttributes, ReactNode, SelectHTMLAttributes, TextareaHTMLAttributes } from "react";
import { forwardRef, useId } from "react";
import { cn } from "@/lib/cn";

const control =
  "block w-full min-h-11 rounded border border-asphalt-300 bg-white px-3 py-2 text-base text-asphalt-900 placeholder:text-asphalt-400 aria-[invalid=true]:border-condition-replace";

export const Input = forwardRef<HTMLInputElement, InputHTMLAttributes<HTMLInputElement>>(function Input(
  { className, ...props },
  ref,
) {
  return <input ref={ref} className={cn(control, className)} {...props} />;
});

export const Select = forwardRef<HTMLSelectElement, SelectHTMLAttributes<HTMLSelectElement>>(function Select(
  { className, ...props },
  ref,
) {
  return <select ref={ref} className={cn(control, "pr-8", className)} {...props} />;
});

export const Textarea = forwardRef<HTMLTextAreaElement, TextareaHTMLAttributes<HTMLTextAreaElement>>(function Textarea(
  { className, ...props },
  ref,
) {
  return <textarea ref={ref} className={cn(control, "min-h-24", className)} {...props} />;
});

export type FieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | string[];
  className?: string;
  /** Renders the control with the ids that tie label, hint and error to it. */
  children: (ids: { id: string; describedBy?: string; invalid: boolean }) => ReactNode;
};

/** A label, a control, a hint and an error message, wired for screen readers. */
export function Field({ label, hint, error, className, children }: FieldProps) {
  const id = useId();
  const message = Array.isArray(error) ? error[0] : error;
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = message ? `${id}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;
  return (
    <div className={cn("space-y-1", className)}>
      <label htmlFor={id} className="block text-sm font-semibold text-asphalt-800">
        {label}
      </label>
      {children({ id, describedBy, invalid: !!message })}
      {hint ? (
        <p id={hintId} className="text-xs text-asphalt-600">
          {hint}
        </p>
      ) : null}
      {message ? (
        <p id={errorId} className="text-sm font-semibold text-condition-replace">
          {message}
        </p>
      ) : null}
    </div>
  );
}
