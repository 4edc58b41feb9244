/**
 * Turns what a reader types into the search box into a safe MariaDB boolean-mode full-text query over the
 * entry_revisions_fulltext index: every word must appear (+word), a trailing "*" is kept as a prefix search, and
 * "quoted phrases" stay phrases. Operator characters a reader did not mean are dropped, so no input is a syntax error.
 */

// InnoDB's default full-text stopwords (INNODB_FT_DEFAULT_STOPWORD, MariaDB documentation, from memory):
// a required stopword would match nothing, so they are left out of the query.
const STOPWORDS = new Set(
  "a about an are as at be by com de en for from how i in is it la of on or that the this to was what when where who will with und www".split(" "),
);
// innodb_ft_min_token_size defaults to 3 (MariaDB documentation): shorter words are not in the index.
export const MIN_WORD_CHARS = 3;

export type SearchQuery = { boolean: string; words: string[]; ignored: string[] };

function wordsOf(text: string): string[] {
  return text.toLowerCase().match(/[\p{L}\p{N}_]+\*?/gu) ?? [];
}

function usable(word: string): boolean {
  const bare = word.replace(/\*$/, "");
  return Array.from(bare).length >= MIN_WORD_CHARS && !STOPWORDS.has(bare);
}

/** Build the boolean-mode query for a search text; `boolean` is "" when no word is long enough to search for. */
export function toBooleanQuery(text: string): SearchQuery {
  const parts: string[] = [];
  const words: string[] = [];
  const ignored: string[] = [];
  const phraseRe = /"([^"]*)"/g;
  const rest = text.replace(phraseRe, (_m, phrase: string) => {
    const inPhrase = wordsOf(phrase).map((w) => w.replace(/\*$/, ""));
    if (inPhrase.some(usable)) {
      parts.push(`+"${inPhrase.join(" ")}"`);
      words.push(...inPhrase.filter(usable));
    } else {
      ignored.push(...inPhrase);
    }
    return " ";
  });
  for (const word of wordsOf(rest)) {
    if (!usable(word)) {
      ignored.push(word);
      continue;
    }
    if (!parts.includes(`+${word}`)) parts.push(`+${word}`);
    words.push(word.replace(/\*$/, ""));
  }
  return { boolean: parts.join(" "), words, ignored };
}
