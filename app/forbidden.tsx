import Link from "next/link";

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1>Not for your role</h1>
      <p className="mt-2 text-ink-soft">Your account may not open this page. Ask the shop lead if you need it.</p>
      <p className="mt-4"><Link href="/">Back to your home page</Link></p>
    </main>
  );
}
