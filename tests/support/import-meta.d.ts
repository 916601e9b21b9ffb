// Vite's import.meta.glob, as vitest provides it (vite itself is nested inside vitest).
interface ImportMeta {
  glob<T>(pattern: string, options: { eager: true; import: string }): Record<string, T>;
}
