import { forwardRef, useId, type ReactNode, type TextareaHTMLAttributes } from "react";
import { cn } from "./cn";
import { FieldFrame } from "./field";

type Props = TextareaHTMLAttributes<HTMLTextAreaElement> & { label: string; error?: string; hint?: ReactNode };

/** A multi-line field with its label and validation message, like TextField. */
export const TextAreaField = forwardRef<HTMLTextAreaElement, Props>(function TextAreaField({ label, error, hint, className, id, ...props }, ref) {
  const generated = useId();
  const fieldId = id ?? generated;
  return (
    <FieldFrame label={label} error={error} hint={hint} id={fieldId}>
      <textarea
        ref={ref}
        id={fieldId}
        rows={3}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${fieldId}-error` : undefined}
        className={cn(
          "w-full rounded-lg border border-line bg-surface px-3 py-2 text-ink placeholder:text-muted focus:border-moss focus:outline-none aria-[invalid=true]:border-danger",
          className,
        )}
        {...props}
      />
    </FieldFrame>
  );
});
