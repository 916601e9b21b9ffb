import { setTheme } from "@/app/(shop)/actions";
import type { Theme } from "@/db/schema";

/** Switches between the light palette and the high-contrast dark workshop theme; the choice stays with the account. */
export function ThemeSwitch({ theme }: { theme: Theme }) {
  const dark = theme === "dark";
  return (
    <form action={setTheme}>
      <input type="hidden" name="theme" value={dark ? "light" : "dark"} />
      <button type="submit" aria-pressed={dark} data-testid="theme-switch"
        className="min-h-9 whitespace-nowrap rounded border border-on-bar/50 px-2 py-1 text-on-bar hover:bg-on-bar/10">
        Dark theme
      </button>
    </form>
  );
}
