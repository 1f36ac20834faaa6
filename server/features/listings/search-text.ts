/**
 * Splits search words between MariaDB's FULLTEXT index and a pattern match. InnoDB's full-text index leaves out
 * words shorter than innodb_ft_min_token_size (3 by default) and its stopwords, so "OO", "TT", "H0" or "DC" would
 * silently match nothing; those short words are matched against the text instead (see search-sql.ts).
 */

/** innodb_ft_min_token_size, the server default (MariaDB 10.11). */
export const FULLTEXT_MIN_WORD = 3;

/** InnoDB's default full-text stopwords (INFORMATION_SCHEMA.INNODB_FT_DEFAULT_STOPWORD). */
const STOPWORDS = new Set(
  (
    'a about an are as at be by com de en for from how i in is it la of on or that the this to was what when ' +
    'where who will with und www'
  ).split(' '),
);

/** Short words matched by pattern: few, as each costs a scan of the rows the other filters leave. */
const MAX_SHORT_WORDS = 4;
const MAX_FULLTEXT_WORDS = 16;

export interface SearchText {
  /** Words for MATCH … AGAINST, space-separated; empty when none qualify. */
  fulltext: string;
  /** Two-character words, letters and digits only, each matched as a whole word. */
  shortWords: string[];
}

/**
 * Words of letters and digits, lower-cased. Everything else (quotes, operators, SQL) separates words and is dropped,
 * so nothing but plain words reaches the database, and then only as parameters.
 */
export function splitSearchText(q: string | undefined): SearchText | null {
  if (!q) return null;
  const words = [...new Set(q.toLowerCase().split(/[^\p{L}\p{N}]+/u))].filter((w) => w && !STOPWORDS.has(w));
  const fulltext = words.filter((w) => w.length >= FULLTEXT_MIN_WORD).slice(0, MAX_FULLTEXT_WORDS);
  // One-character words ("N", "0") match almost everything; the scale filter serves them better.
  const shortWords = words.filter((w) => w.length === FULLTEXT_MIN_WORD - 1).slice(0, MAX_SHORT_WORDS);
  if (fulltext.length === 0 && shortWords.length === 0) return null;
  return { fulltext: fulltext.join(' '), shortWords };
}

/**
 * A whole-word pattern for REGEXP. A plain LIKE '%oo%' would also match "wood" and "door"; bounding the word by
 * non-alphanumerics keeps "OO gauge" and "OO-gauge" and drops those. The word holds only letters and digits
 * (see splitSearchText), so it carries no pattern syntax.
 */
export const wholeWordPattern = (word: string) => `(^|[^[:alnum:]])${word}([^[:alnum:]]|$)`;
