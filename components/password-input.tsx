"use client";

import { forwardRef, useState } from "react";
import { controlClasses } from "./ui/field";

/** A password input with a show/hide toggle; pasting is always allowed (OWASP ASVS 6.2.7). */
export const PasswordInput = forwardRef<
  HTMLInputElement,
  React.InputHTMLAttributes<HTMLInputElement> & { invalid?: boolean }
>(function PasswordInput({ invalid = false, className, ...props }, ref) {
  const [visible, setVisible] = useState(false);
  return (
    <div className="relative">
      <input ref={ref} {...props} type={visible ? "text" : "password"} className={`${controlClasses(invalid)} h-10 pr-20 ${className ?? ""}`} />
      <button
        type="button"
        onClick={() => setVisible((v) => !v)}
        className="absolute inset-y-1 right-1 rounded-md px-2 text-xs font-medium text-ink-soft hover:bg-sunken"
        aria-label={visible ? "Hide password" : "Show password"}
      >
        {visible ? "Hide" : "Show"}
      </button>
    </div>
  );
});
