/**
 * A box that scrolls (a wide table on a tablet or phone, a long list beside a chart). It is a named
 * region in the tab order, so a keyboard can reach it and scroll it with the arrow keys. It is also
 * the containing block of what is positioned inside it: a visually hidden label in a wide table
 * (absolutely positioned) is then clipped with the table instead of widening the whole page.
 */
export function ScrollRegion({ label, className = "", children, ...rest }: {
  label: string;
  className?: string;
  children: React.ReactNode;
} & Omit<React.HTMLAttributes<HTMLDivElement>, "role" | "tabIndex" | "aria-label" | "className">) {
  return (
    <div role="region" aria-label={label} tabIndex={0} className={`relative ${className}`} {...rest}>
      {children}
    </div>
  );
}
