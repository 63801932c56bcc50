export const IMPORT_KINDS = ['wells', 'surveys', 'pressures', 'tops', 'las'] as const;
export type ImportKind = (typeof IMPORT_KINDS)[number];
