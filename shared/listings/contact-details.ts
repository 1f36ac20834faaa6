/**
 * Spots e-mail addresses and phone numbers in a listing's text, so a moderator sees them flagged and the seller's
 * form can warn before submitting. Buyers and sellers talk through Benchwright, so such details are sent back.
 * A hint for a person, not a verdict: it errs towards flagging.
 */
export type ContactKind = 'email' | 'phone';

export interface ContactFlag {
  kind: ContactKind;
  /** The text that matched, as written. */
  match: string;
}

/** name@host.tld, with any top-level domain. */
const EMAIL = /[\p{L}\p{N}._%+-]+@[\p{L}\p{N}-]+(?:\.[\p{L}\p{N}-]+)*\.\p{L}{2,}/gu;

/** Disguised addresses: "name at host dot co dot uk", "name(at)host(dot)com"; only common endings, to spare prose. */
const DISGUISED_EMAIL =
  /[\p{L}\p{N}._%+-]+\s*(?:\(at\)|\[at\]|\sat\s)\s*[\p{L}\p{N}-]+(?:\s*(?:\(dot\)|\[dot\]|\sdot\s)\s*[\p{L}\p{N}-]+)*\s*(?:\(dot\)|\[dot\]|\sdot\s)\s*(?:com|org|net|uk|ie|eu|info)\b/giu;

/**
 * UK and Irish numbers: +44 / +353 / 0044 / 00353 or a leading 0, then 9 or 10 more digits, allowing spaces,
 * dashes, dots and brackets between them (07700 900123, +44 (0)1632 960001, +353 1 234 5678).
 */
const PHONE = /(?:\+|\b00)(?:44|353)[\s.-]?(?:\(0\)[\s.-]?)?\d(?:[\s.()-]?\d){7,9}\b|\b0\d(?:[\s.()-]?\d){8,9}\b/g;

/** Every e-mail address and phone number found in `text`, in order of appearance. */
export function findContactDetails(text: string): ContactFlag[] {
  const flags: { at: number; flag: ContactFlag }[] = [];
  for (const pattern of [EMAIL, DISGUISED_EMAIL])
    for (const m of text.matchAll(pattern)) flags.push({ at: m.index, flag: { kind: 'email', match: m[0].trim() } });
  for (const m of text.matchAll(PHONE)) flags.push({ at: m.index, flag: { kind: 'phone', match: m[0].trim() } });
  return flags.sort((a, b) => a.at - b.at).map((f) => f.flag);
}
