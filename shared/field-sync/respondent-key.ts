/**
 * The respondent key of a finished interview, made on the device from a reference the
 * enumerator types (a phone number, a household or stall code — never a name). Only the key
 * leaves the phone; the same reference typed in two interviews of one study gives the same key,
 * and in another study a different one, so keys cannot be matched across studies.
 */

/** Fewer letters or digits than this tell too few respondents apart to be worth a flag. */
export const minRespondentReferenceLength = 4;

/** What the enumerator may type at most; a longer reference is a mistake, not an identifier. */
export const maxRespondentReferenceLength = 64;

/**
 * Separators people type differently each time: white space, hyphens and dashes of every kind,
 * dots, brackets and plus signs. Dropping `+` everywhere means "+254 712 345 678" and
 * "254712345678" match; a number typed in its local form ("0712 345 678") does not match its
 * international form, since the device cannot know the country code.
 */
const separators = /[\s\-\u2010-\u2015\u2212.()[\]{}+]/gu;

/**
 * The reference as it is hashed: compatibility-normalised (full-width digits become plain
 * ones), lower-cased without regard to the phone's language, separators dropped.
 */
export function normaliseRespondentReference(typed: string): string {
  return typed.normalize('NFKC').toLowerCase().replace(separators, '');
}

/**
 * What is wrong with a typed reference, or null when it can be used (or is empty, meaning no
 * reference). The message names the field, as the runner shows it among the screen's problems.
 */
export function respondentReferenceProblem(typed: string): string | null {
  const normalised = normaliseRespondentReference(typed);
  if (normalised.length === 0) return null;
  if (normalised.length < minRespondentReferenceLength) {
    return `Respondent reference: type at least ${minRespondentReferenceLength} letters or digits, or leave it empty`;
  }
  if (typed.length > maxRespondentReferenceLength) {
    return `Respondent reference: keep it under ${maxRespondentReferenceLength} characters`;
  }
  return null;
}

/**
 * The key: SHA-256 over the UTF-8 of `studyId + ':' + normalised reference`, in base64url
 * without padding (43 characters, within the 16–128 the sync schema allows). Runs wherever
 * WebCrypto does: the browser and Node alike.
 *
 * @throws Error when the reference is empty or too short (see `respondentReferenceProblem`).
 */
export async function respondentKeyFor(studyId: string, typed: string): Promise<string> {
  const normalised = normaliseRespondentReference(typed);
  const problem = respondentReferenceProblem(typed);
  if (normalised.length === 0 || problem) throw new Error(problem ?? 'No respondent reference');
  const bytes = new TextEncoder().encode(`${studyId}:${normalised}`);
  return base64url(new Uint8Array(await crypto.subtle.digest('SHA-256', bytes)));
}

function base64url(bytes: Uint8Array): string {
  const binary = Array.from(bytes, (byte) => String.fromCharCode(byte)).join('');
  return btoa(binary).replace(/\+/g, '-').replace(/\//g, '_').replace(/=+$/, '');
}
