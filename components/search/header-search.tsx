import Form from "next/form";

/** The search box in the header: submitting jumps to the write-up search with the words filled in. */
export function HeaderSearch({ id = "header-search", className = "" }: { id?: string; className?: string }) {
  return (
    <Form action="/writeups" role="search" className={`flex items-center ${className}`}>
      <label htmlFor={id} className="sr-only">Search write-ups</label>
      <input
        id={id}
        name="q"
        type="search"
        placeholder="Search…"
        autoComplete="off"
        className="w-full min-w-0 rounded-md border bg-bar px-2 py-1.5 text-sm text-on-bar placeholder:text-on-bar/75 sm:w-36"
      />
    </Form>
  );
}
