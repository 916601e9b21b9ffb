import Form from "next/form";

/** The search box in the header: submitting jumps to the write-up search with the words filled in. */
export function HeaderSearch() {
  return (
    <Form action="/writeups" role="search" className="flex items-center">
      <label htmlFor="header-search" className="sr-only">Search write-ups</label>
      <input
        id="header-search"
        name="q"
        type="search"
        placeholder="Search…"
        autoComplete="off"
        className="w-28 rounded-md border border-paper/30 bg-ink-soft/40 px-2 py-1 text-sm text-paper placeholder:text-paper/60 focus:w-56 focus:bg-white focus:text-ink"
      />
    </Form>
  );
}
