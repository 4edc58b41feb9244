/** The feed's filter bar: a plain GET form, so every filtered view is a link that can be shared. */
import { ENTRY_CATEGORIES } from "@/db/schema/logbook";
import type { FeedQuery } from "./feed-query";
import { CATEGORY_LABELS } from "./categories";

type Props = { query: FeedQuery; authors: { id: number; name: string }[]; tags: string[] };
const field = "mt-1 w-full rounded border border-line bg-raised px-2 py-1 text-sm";

/** Search, category, author, run, tag and date range. */
export function FeedFilters({ query, authors, tags }: Props) {
  return (
    <form method="get" action="/logbook" role="search" aria-label="Filter the logbook" className="grid gap-2 rounded-lg border border-line bg-panel p-3 sm:grid-cols-2 lg:grid-cols-[2fr_1fr_1fr_6rem_1fr_9rem_9rem_auto]">
      <label className="block text-xs text-muted">
        Search text
        <input name="q" type="search" defaultValue={query.q ?? ""} placeholder="words in title or text" className={field} />
      </label>
      <label className="block text-xs text-muted">
        In category
        <select name="category" defaultValue={query.category ?? ""} className={field}>
          <option value="">all categories</option>
          {ENTRY_CATEGORIES.map((c) => <option key={c} value={c}>{CATEGORY_LABELS[c]}</option>)}
        </select>
      </label>
      <label className="block text-xs text-muted">
        Written by
        <select name="author" defaultValue={query.author ? String(query.author) : ""} className={field}>
          <option value="">anyone</option>
          {authors.map((a) => <option key={a.id} value={a.id}>{a.name}</option>)}
        </select>
      </label>
      <label className="block text-xs text-muted">
        Run
        <input name="run" inputMode="numeric" defaultValue={query.run ?? ""} className={field} />
      </label>
      <label className="block text-xs text-muted">
        With tag
        <input name="tag" list="feed-tags" defaultValue={query.tag ?? ""} className={field} />
        <datalist id="feed-tags">{tags.map((t) => <option key={t} value={t} />)}</datalist>
      </label>
      <label className="block text-xs text-muted">
        From (UTC)
        <input name="from" type="date" defaultValue={query.from ?? ""} className={field} />
      </label>
      <label className="block text-xs text-muted">
        To (UTC, inclusive)
        <input name="to" type="date" defaultValue={query.to ?? ""} className={field} />
      </label>
      <div className="flex items-end gap-2">
        <button type="submit" className="rounded bg-accent px-3 py-1 text-sm font-medium text-ground">Filter</button>
        <a href="/logbook" className="rounded px-2 py-1 text-sm text-muted hover:text-ink">Clear</a>
      </div>
    </form>
  );
}
