import type { GlobalThemeOverrides } from 'naive-ui';

/**
 * Porelith's own palette: deep teal for action, slate for structure, amber for the one accent
 * (the pore in the mark, warnings). Dark mode lifts teal so it keeps contrast on slate.
 */
export const PALETTE = {
  teal700: '#0B5C5E',
  teal600: '#0E7173',
  teal500: '#13878A',
  teal300: '#4FB8B4',
  teal200: '#7ACFCA',
  amber500: '#D98E04',
  amber400: '#E9A93A',
  slate900: '#0F171C',
  slate850: '#141E24',
  slate800: '#1A262D',
  slate700: '#26353E',
  slate100: '#EEF2F4',
  slate50: '#F6F8F9',
  ink: '#1B262C',
} as const;

export const FONT_FAMILY = "Inter, system-ui, -apple-system, 'Segoe UI', Roboto, 'Helvetica Neue', Arial, sans-serif";

const shared: GlobalThemeOverrides['common'] = {
  fontFamily: FONT_FAMILY,
  fontWeightStrong: '600',
  borderRadius: '6px',
  borderRadiusSmall: '4px',
};

export const lightOverrides: GlobalThemeOverrides = {
  common: {
    ...shared,
    primaryColor: PALETTE.teal600,
    primaryColorHover: PALETTE.teal500,
    primaryColorPressed: PALETTE.teal700,
    primaryColorSuppl: PALETTE.teal500,
    warningColor: PALETTE.amber500,
    warningColorHover: PALETTE.amber400,
    warningColorPressed: '#B87700',
    warningColorSuppl: PALETTE.amber400,
    bodyColor: PALETTE.slate50,
    textColor1: PALETTE.ink,
    textColor2: '#2E3B42',
    textColor3: '#5F6E76',
    borderColor: '#D9E0E4',
    dividerColor: '#E5EAED',
  },
  Layout: { color: PALETTE.slate50, headerColor: '#FFFFFF', siderColor: '#FFFFFF', footerColor: PALETTE.slate100 },
  Menu: {
    itemTextColorActive: PALETTE.teal700,
    itemIconColorActive: PALETTE.teal700,
    itemColorActive: 'rgba(14, 113, 115, 0.10)',
    itemColorActiveHover: 'rgba(14, 113, 115, 0.14)',
  },
  DataTable: { thColor: PALETTE.slate100 },
};

export const darkOverrides: GlobalThemeOverrides = {
  common: {
    ...shared,
    primaryColor: PALETTE.teal300,
    primaryColorHover: PALETTE.teal200,
    primaryColorPressed: PALETTE.teal500,
    primaryColorSuppl: PALETTE.teal500,
    warningColor: PALETTE.amber400,
    warningColorHover: '#F0BD62',
    warningColorPressed: PALETTE.amber500,
    warningColorSuppl: PALETTE.amber500,
    bodyColor: PALETTE.slate900,
    cardColor: PALETTE.slate850,
    modalColor: PALETTE.slate800,
    popoverColor: PALETTE.slate800,
    tableColor: PALETTE.slate850,
    borderColor: '#2F3F48',
    dividerColor: '#24323A',
  },
  Layout: {
    color: PALETTE.slate900,
    headerColor: PALETTE.slate850,
    siderColor: PALETTE.slate850,
    footerColor: PALETTE.slate850,
  },
  Menu: {
    itemTextColorActive: PALETTE.teal200,
    itemIconColorActive: PALETTE.teal200,
    itemColorActive: 'rgba(79, 184, 180, 0.14)',
    itemColorActiveHover: 'rgba(79, 184, 180, 0.2)',
  },
  DataTable: { thColor: PALETTE.slate800 },
};
