import { describe, expect, it } from 'vitest';
import { linkify, sameOriginPath } from './linkify';

// Expected hrefs are produced by the WHATWG URL parser (Node's global URL), the same one browsers use.
describe('linkify', () => {
  it('finds an invitation link inside a mail body and keeps the text around it', () => {
    const href = 'http://127.0.0.1:8080/accept-invite?token=Zk3pQ9xYw2vL8mN4bR7tC1sD';
    const parts = linkify(`Hello Lin,\n\nOpen ${href} to join North Shelf.\n`);
    expect(parts).toEqual([
      { kind: 'text', text: 'Hello Lin,\n\nOpen ' },
      { kind: 'link', text: href, href: new URL(href).href },
      { kind: 'text', text: ' to join North Shelf.\n' },
    ]);
  });

  it('leaves sentence punctuation outside the link', () => {
    const parts = linkify('Reset here: https://porelith.example/reset-password?token=abc.');
    expect(parts[1]).toEqual({
      kind: 'link',
      text: 'https://porelith.example/reset-password?token=abc',
      href: 'https://porelith.example/reset-password?token=abc',
    });
    expect(parts[2]).toEqual({ kind: 'text', text: '.' });
  });

  it('never turns other schemes into links', () => {
    const text = 'javascript:alert(1) data:text/html,hi ftp://files.example/x';
    expect(linkify(text)).toEqual([{ kind: 'text', text }]);
  });

  it('handles several links and text without links', () => {
    expect(linkify('no links here')).toEqual([{ kind: 'text', text: 'no links here' }]);
    const links = linkify('a https://x.example/1 b https://y.example/2').filter((p) => p.kind === 'link');
    expect(links.map((l) => l.text)).toEqual(['https://x.example/1', 'https://y.example/2']);
  });
});

describe('sameOriginPath', () => {
  it('returns path, query and hash for the same origin only', () => {
    expect(sameOriginPath('http://localhost:5173/reset-password?token=x#top', 'http://localhost:5173')).toBe('/reset-password?token=x#top');
    // Port is part of the origin (WHATWG URL: origin = scheme, host, port).
    expect(sameOriginPath('http://localhost:8080/reset-password?token=x', 'http://localhost:5173')).toBeNull();
  });
});
