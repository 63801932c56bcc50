/** A piece of plain text, or a web link found in it. */
export type TextPart = { kind: 'text'; text: string } | { kind: 'link'; text: string; href: string };

// http(s) only: mail bodies here carry app links, and other schemes (javascript:, data:) must never become links.
const URL_PATTERN = /https?:\/\/[^\s<>"'`]+/g;
// Sentence punctuation right after a link belongs to the sentence, not the URL.
const TRAILING_PUNCTUATION = /[.,;:!?)\]}]+$/;

/**
 * Splits text into plain parts and http(s) links, for showing mail bodies with clickable links.
 * Written here because it is a dozen lines and must refuse every non-web scheme.
 * @example
 * linkify('Open https://app.example/accept-invite?token=abc.')
 * // [{ kind: 'text', text: 'Open ' }, { kind: 'link', text: 'https://…abc', href: 'https://…abc' }, { kind: 'text', text: '.' }]
 */
export function linkify(text: string): TextPart[] {
  const parts: TextPart[] = [];
  let last = 0;
  for (const match of text.matchAll(URL_PATTERN)) {
    const start = match.index ?? 0;
    const candidate = match[0].replace(TRAILING_PUNCTUATION, '');
    const href = toHref(candidate);
    if (!href) continue;
    if (start > last) parts.push({ kind: 'text', text: text.slice(last, start) });
    parts.push({ kind: 'link', text: candidate, href });
    last = start + candidate.length;
  }
  if (last < text.length) parts.push({ kind: 'text', text: text.slice(last) });
  return parts;
}

function toHref(candidate: string): string | null {
  try {
    const url = new URL(candidate);
    return url.protocol === 'http:' || url.protocol === 'https:' ? url.href : null;
  } catch {
    return null;
  }
}

/**
 * The in-app path of a link to this same origin, or null for links elsewhere.
 * @example sameOriginPath('http://localhost:5173/reset-password?token=x', 'http://localhost:5173') // '/reset-password?token=x'
 */
export function sameOriginPath(href: string, origin: string): string | null {
  const url = new URL(href);
  return url.origin === origin ? `${url.pathname}${url.search}${url.hash}` : null;
}
