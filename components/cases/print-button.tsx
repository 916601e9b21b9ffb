"use client";

export function PrintButton({ children }: { children: React.ReactNode }) {
  return (
    <button type="button" onClick={() => window.print()} className="min-h-11 rounded-md bg-copper px-4 py-2 font-medium text-white hover:bg-copper-dark">
      {children}
    </button>
  );
}
