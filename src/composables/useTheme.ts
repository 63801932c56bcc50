import { computed, ref, watch } from 'vue';
import { darkTheme, type GlobalTheme, type GlobalThemeOverrides } from 'naive-ui';
import { darkOverrides, lightOverrides } from '@/theme/palette';
import { readStored, STORAGE_KEYS, writeStored } from '@/utils/storage';

export type ThemeMode = 'light' | 'dark';

function initialMode(): ThemeMode {
  const stored = readStored(STORAGE_KEYS.theme);
  if (stored === 'light' || stored === 'dark') return stored;
  const prefersDark = globalThis.matchMedia?.('(prefers-color-scheme: dark)').matches ?? false;
  return prefersDark ? 'dark' : 'light';
}

// One mode for the whole page: every caller sees the same ref.
let mode: ReturnType<typeof ref<ThemeMode>> | null = null;

function sharedMode() {
  if (mode) return mode;
  mode = ref<ThemeMode>(initialMode());
  watch(
    mode,
    (value) => {
      writeStored(STORAGE_KEYS.theme, value ?? 'light');
      // Lets plain CSS (scrollbars, the page behind Naive UI) follow the theme too.
      if (typeof document !== 'undefined') document.documentElement.dataset.theme = value;
    },
    { immediate: true, flush: 'sync' },
  );
  return mode;
}

/**
 * Light or dark, remembered in localStorage; the first visit follows the system setting.
 * @example
 * const { mode, theme, overrides, toggle } = useTheme();
 * toggle(); // light ⇄ dark
 */
export function useTheme() {
  const current = sharedMode();
  const isDark = computed(() => current.value === 'dark');
  const theme = computed<GlobalTheme | null>(() => (isDark.value ? darkTheme : null));
  const overrides = computed<GlobalThemeOverrides>(() => (isDark.value ? darkOverrides : lightOverrides));

  function setMode(next: ThemeMode): void {
    current.value = next;
  }

  function toggle(): void {
    setMode(isDark.value ? 'light' : 'dark');
  }

  return { mode: computed(() => current.value as ThemeMode), isDark, theme, overrides, setMode, toggle };
}

/** Forgets the shared mode so a test can start from storage again. */
export function resetThemeForTests(): void {
  mode = null;
}
