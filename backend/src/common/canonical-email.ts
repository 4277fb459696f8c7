/**
 * The one canonical form of an e-mail address: Unicode NFKC, trimmed, case-folded. Accounts are stored and
 * looked up by it (a binary-collated column, so the database adds no accent or case folding of its own) and
 * the per-account rate limit keys on it, so no spelling of an address reaches an account on a counter of its
 * own (OWASP ASVS 4.0.3 2.2.1 anti-automation; handbook security.md).
 *
 * Case folding: JavaScript has no full Unicode case fold; upper- then lower-casing is the usual approximation
 * (it folds ß to ss and ς to σ as CaseFolding.txt's full mappings do), and NFKC once more afterwards because
 * case mapping can leave a string unnormalised (as Unicode's NFKC_Casefold does).
 */
export function canonicalEmail(address: string): string {
  return address.normalize('NFKC').trim().toUpperCase().toLowerCase().normalize('NFKC');
}
