import Link from "next/link";
import { feedAuthors, listFeed, popularTags } from "@/db/entry-feed";
import { requireRole } from "@/lib/auth/guards";
import { rolesAllow } from "@/lib/auth/permissions";
import { EmptyState } from "@/components/ui/EmptyState";
import { Caution } from "@/components/ui/Caution";
import { FeedFilters } from "@/components/logbook/FeedFilters";
import { FeedTable } from "@/components/logbook/FeedTable";
import { readFeedQuery, toFeedFilters, type FeedQuery } from "@/components/logbook/feed-query";
import { firstIssue } from "@/components/logbook/entry-schema";

export const metadata = { title: "Logbook" };
export const dynamic = "force-dynamic";

const PAGE = 50;

function pageLink(query: FeedQuery, offset: number): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries({ ...query, offset: offset || undefined, limit: undefined })) {
    if (v !== undefined && v !== "") params.set(k, String(v));
  }
  const s = params.toString();
  return s ? `/logbook?${s}` : "/logbook";
}

export default async function LogbookPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const user = await requireRole("entries.read");
  const canWrite = rolesAllow(user.roles, "entries.write");
  const parsed = readFeedQuery(await searchParams);
  const query: FeedQuery = parsed.success ? parsed.data : {};
  const [page, authors, tags] = await Promise.all([
    listFeed({ ...toFeedFilters(query), limit: PAGE }),
    feedAuthors(),
    popularTags(),
  ]);
  const filtered = Object.entries(query).some(([k, v]) => k !== "offset" && v !== undefined);
  const first = page.offset + 1;
  const last = page.offset + page.items.length;
  return (
    <section>
      <div className="mb-3 flex flex-wrap items-center gap-3">
        <h1 className="text-xl font-semibold">Logbook</h1>
        <span className="text-sm text-muted">Newest first · times in UTC</span>
        {canWrite && (
          <div className="ml-auto flex gap-2">
            <Link href="/logbook/new?template=handover" className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-ground">⇄ Start shift handover</Link>
            <Link href="/logbook/new" className="rounded border border-line px-3 py-1.5 text-sm hover:border-accent">✎ New entry</Link>
          </div>
        )}
      </div>
      {(query.category === "cryogenics" || query.category === "radiation") && <Caution />}
      <FeedFilters query={query} authors={authors} tags={tags} />
      {!parsed.success && <p role="alert" className="mt-2 text-sm text-bad">⚠ Filter ignored: {firstIssue(parsed.error).error} ({firstIssue(parsed.error).field})</p>}
      {page.ignoredWords.length > 0 && (
        <p className="mt-2 text-xs text-muted">
          Not searched for (shorter than 3 letters or too common): {page.ignoredWords.join(", ")}
        </p>
      )}
      <div className="mt-4">
        {page.items.length === 0 ? (
          filtered ? (
            <EmptyState title="No entries match these filters">Loosen a filter or <a className="text-accent underline" href="/logbook">clear them all</a>.</EmptyState>
          ) : (
            <EmptyState title="The logbook is empty">
              {canWrite ? "Start with a shift handover or write the first entry with the buttons above." : "Entries appear here once the shift crew writes them."}
            </EmptyState>
          )
        ) : (
          <>
            <p className="mb-1 text-xs text-muted" aria-live="polite">
              {first}–{last} of {page.total} entr{page.total === 1 ? "y" : "ies"}
            </p>
            <FeedTable items={page.items} />
            <nav aria-label="Pages" className="mt-3 flex gap-3 text-sm">
              {page.offset > 0 && <Link href={pageLink(query, Math.max(page.offset - PAGE, 0))} className="text-accent hover:underline">← Newer</Link>}
              {last < page.total && <Link href={pageLink(query, page.offset + PAGE)} className="text-accent hover:underline">Older →</Link>}
            </nav>
          </>
        )}
      </div>
    </section>
  );
}
