// @vitest-environment happy-dom
import { beforeEach, describe, expect, it } from 'vitest';
import { darkTheme } from 'naive-ui';
import { STORAGE_KEYS } from '@/utils/storage';
import { darkOverrides, lightOverrides } from '@/theme/palette';
import { resetThemeForTests, useTheme } from './useTheme';

describe('useTheme', () => {
  beforeEach(() => {
    localStorage.clear();
    resetThemeForTests();
  });

  it('starts from the remembered mode and gives Naive UI its own dark theme', () => {
    localStorage.setItem(STORAGE_KEYS.theme, 'dark');
    const { mode, theme, overrides } = useTheme();
    expect(mode.value).toBe('dark');
    expect(theme.value).toBe(darkTheme);
    expect(overrides.value).toBe(darkOverrides);
  });

  it('toggles, remembers the choice and marks the document', () => {
    localStorage.setItem(STORAGE_KEYS.theme, 'light');
    const { toggle, theme, overrides } = useTheme();
    expect(theme.value).toBeNull();
    expect(overrides.value).toBe(lightOverrides);

    toggle();

    expect(localStorage.getItem(STORAGE_KEYS.theme)).toBe('dark');
    expect(document.documentElement.dataset.theme).toBe('dark');
    expect(theme.value).toBe(darkTheme);
  });

  it('shares one mode between callers', () => {
    localStorage.setItem(STORAGE_KEYS.theme, 'light');
    const a = useTheme();
    const b = useTheme();
    a.setMode('dark');
    expect(b.isDark.value).toBe(true);
  });

  it('ignores a garbled stored value', () => {
    localStorage.setItem(STORAGE_KEYS.theme, 'purple');
    // happy-dom's matchMedia reports no dark preference.
    expect(useTheme().mode.value).toBe('light');
  });
});
