import type { WellStatus } from '@shared/schemas/wells';

/**
 * Colours of the team layers, one set per basemap theme. Chosen for Porelith: teal for drilled wells
 * (the app's action colour), amber for pressure data (the pore in the mark), rose for what is planned.
 * Dark colours are lifted so they keep contrast on the dark sea.
 */
export interface AtlasPalette {
  status: Record<WellStatus, string>;
  wellStroke: string;
  pressureRing: string;
  logsMark: string;
  lotMark: string;
  cluster: string;
  clusterStroke: string;
  clusterText: string;
  label: string;
  labelHalo: string;
  prospectFill: string;
  prospectLine: string;
  prospectSelected: string;
  planned: string;
  plannedCore: string;
  offsetLine: string;
  offsetPicked: string;
  selection: string;
}

export const LIGHT_PALETTE: AtlasPalette = {
  status: {
    drilled: '#0E7173',
    drilling: '#2F6FB3',
    suspended: '#7A5AA6',
    abandoned: '#6B7A83',
    planned: '#A3B1B8',
  },
  wellStroke: '#FFFFFF',
  pressureRing: '#D98E04',
  logsMark: '#1B262C',
  lotMark: '#C0392B',
  cluster: '#13878A',
  clusterStroke: '#E8F4F3',
  clusterText: '#FFFFFF',
  label: '#1B262C',
  labelHalo: '#F6F8F9',
  prospectFill: '#0E7173',
  prospectLine: '#0B5C5E',
  prospectSelected: '#D98E04',
  planned: '#B83B5E',
  plannedCore: '#FFFFFF',
  offsetLine: '#5F6E76',
  offsetPicked: '#D98E04',
  selection: '#1B262C',
};

export const DARK_PALETTE: AtlasPalette = {
  status: {
    drilled: '#4FB8B4',
    drilling: '#6FA3DD',
    suspended: '#A88BD0',
    abandoned: '#9AA7AE',
    planned: '#5E6D75',
  },
  wellStroke: '#0F171C',
  pressureRing: '#E9A93A',
  logsMark: '#EEF2F4',
  lotMark: '#F07A6A',
  cluster: '#2A8F8C',
  clusterStroke: '#7ACFCA',
  clusterText: '#FFFFFF',
  label: '#EEF2F4',
  labelHalo: '#0F171C',
  prospectFill: '#4FB8B4',
  prospectLine: '#7ACFCA',
  prospectSelected: '#E9A93A',
  planned: '#E0688C',
  plannedCore: '#141E24',
  offsetLine: '#9AA7AE',
  offsetPicked: '#E9A93A',
  selection: '#FFFFFF',
};

/**
 * The palette for a theme.
 * @example atlasPalette('dark').status.drilled // '#4FB8B4'
 */
export function atlasPalette(theme: 'light' | 'dark'): AtlasPalette {
  return theme === 'dark' ? DARK_PALETTE : LIGHT_PALETTE;
}
