/**
 * The label fonts: Inter (SIL Open Font License) from @fontsource/inter, copied into tiles/fonts/ by the
 * build so that the archive, the style and the files the server sends are one versioned set, and the
 * server reads nothing from node_modules at run time.
 */

/** Inter's "latin" subset (U+0000–00FF and a few more) covers every Natural Earth country name and our sea names. */
export const BASEMAP_FONTS = {
  regular: { stack: 'Inter Regular', file: 'inter-latin-400-normal.woff2' },
  semibold: { stack: 'Inter SemiBold', file: 'inter-latin-600-normal.woff2' },
  italic: { stack: 'Inter Italic', file: 'inter-latin-400-italic.woff2' },
} as const;

export const FONT_LICENSE_FILE = 'OFL.txt';
