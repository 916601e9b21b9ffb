"use client";
import { useFormStatus } from "react-dom";

export function SubmitButton({ children, pendingText, className = "", name, value }: {
  children: React.ReactNode;
  pendingText?: string;
  className?: string;
  name?: string;
  value?: string;
}) {
  const { pending } = useFormStatus();
  return (
    <button
      type="submit"
      name={name}
      value={value}
      disabled={pending}
      aria-disabled={pending}
      className={`inline-flex items-center justify-center rounded-md bg-copper px-4 py-2 font-medium text-white shadow-sm hover:bg-copper-dark disabled:opacity-60 ${className}`}
    >
      {pending ? (pendingText ?? "Working…") : children}
    </button>
  );
}
