import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1>Nothing here</h1>
      <p className="mt-2 text-ink-soft">That page or record does not exist, or it was removed.</p>
      <p className="mt-4"><Link href="/">Back to your home page</Link></p>
    </main>
  );
}
