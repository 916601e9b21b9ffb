import Link from "next/link";
import { may } from "@/lib/auth/roles";
import type { SessionUser } from "@/lib/auth/session-user";
import { renderMarkdown, wantsToc } from "@/lib/markdown/render";
import { thumbUrl, uploadIdsIn, uploadUrl } from "@/lib/storage/urls";
import type { WriteupView } from "@/lib/writeups/queries";
import { Chip, ChipRow, StatusBadge } from "./chips";
import { formatDay } from "@/lib/format";
import { MarkdownBody } from "./markdown-body";
import { PublishButton } from "./publish-button";
import { SafetyNote } from "./safety-note";
import { TableOfContents } from "./toc";

export function WriteupArticle({ writeup, user }: { writeup: WriteupView; user: SessionUser }) {
  const rendered = renderMarkdown(writeup.body);
  const inline = new Set(uploadIdsIn(writeup.body));
  const morePhotos = writeup.photos.filter((p) => !inline.has(p.id));
  return (
    <div className="grid gap-8 lg:grid-cols-[minmax(0,1fr)_17rem]">
      <article className="min-w-0 rounded-lg border border-ink-faint/30 bg-white p-6 shadow-sm" data-testid="writeup-article">
        <header className="mb-4 border-b border-ink-faint/20 pb-4">
          <div className="mb-2 flex items-center gap-3 text-sm">
            <Link href="/writeups">← All write-ups</Link>
            <StatusBadge status={writeup.status} />
          </div>
          <h1 className="text-3xl">{writeup.title}</h1>
          <p className="mt-2 text-lg text-ink-soft">{writeup.summary}</p>
          <p className="mt-3 text-sm text-ink-faint">
            Written by {writeup.authorName ?? "a former colleague"}
            {writeup.status === "published"
              ? ` · published ${formatDay(writeup.publishedAt)}${writeup.publisherName ? ` by ${writeup.publisherName}` : ""}`
              : ` · draft, last saved ${formatDay(writeup.updatedAt)}`}
          </p>
        </header>
        <MarkdownBody html={rendered.html} testId="writeup-body" />
        {morePhotos.length ? (
          <section className="mt-8">
            <h2 className="mb-3">Photos</h2>
            <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3">
              {morePhotos.map((p) => (
                <li key={p.id}>
                  <a href={uploadUrl(p.id)} target="_blank" rel="noopener">
                    {/* eslint-disable-next-line @next/next/no-img-element -- our own authenticated upload route */}
                    <img src={thumbUrl(p.id)} alt={p.originalName} loading="lazy" className="w-full rounded-md border border-ink-faint/30" />
                  </a>
                </li>
              ))}
            </ul>
          </section>
        ) : null}
        <div className="mt-8"><SafetyNote /></div>
      </article>
      <aside className="flex flex-col gap-5 lg:sticky lg:top-4 lg:self-start">
        {writeup.mayEdit || (writeup.status === "draft" && may(user.role, "writeup:publish")) ? (
          <div className="flex flex-wrap items-start gap-2">
            {writeup.mayEdit ? (
              <Link href={`/writeups/${writeup.id}/edit`} className="rounded-md border border-copper px-4 py-2 font-medium text-copper-dark no-underline hover:bg-copper-light hover:no-underline">
                Edit
              </Link>
            ) : null}
            {writeup.status === "draft" && may(user.role, "writeup:publish") ? <PublishButton id={writeup.id} /> : null}
          </div>
        ) : null}
        {wantsToc(rendered) ? <TableOfContents entries={rendered.toc} /> : null}
        {writeup.causes.length ? (
          <ChipRow label="Causes">
            {writeup.causes.map((c) => <Chip key={c.id} tone="cause" href={`/writeups?cause=${c.slug}`}>{c.name}</Chip>)}
          </ChipRow>
        ) : null}
        {writeup.families.length ? (
          <ChipRow label="Motor families">
            {writeup.families.map((f) => <Chip key={f.id} tone="family" href={`/writeups?family=${f.slug}`}>{f.name}</Chip>)}
          </ChipRow>
        ) : null}
        {writeup.parts.length ? (
          <ChipRow label="Parts">{writeup.parts.map((p) => <Chip key={p.id} tone="part">{p.name}</Chip>)}</ChipRow>
        ) : null}
        {writeup.tags.length ? (
          <ChipRow label="Tags">{writeup.tags.map((t) => <Chip key={t} tone="tag" href={`/writeups?tag=${encodeURIComponent(t)}`}>{t}</Chip>)}</ChipRow>
        ) : null}
        {writeup.caseId ? (
          <div>
            <p className="mb-1 text-xs uppercase tracking-wide text-ink-faint">From the case</p>
            {may(user.role, "case:read")
              ? <Link href={`/cases/${writeup.caseId}`} data-testid="linked-case">{writeup.caseReference}</Link>
              : <p className="text-sm text-ink-soft">Written up from a bench case.</p>}
          </div>
        ) : null}
      </aside>
    </div>
  );
}
