/** The switches in the layer panel; each one shows or hides a group of map layers. */
export const LAYER_TOGGLES = ['wells', 'wellNames', 'prospects', 'plannedWells', 'offsets'] as const;
export type LayerToggle = (typeof LAYER_TOGGLES)[number];
export type LayerToggles = Record<LayerToggle, boolean>;

export const TOGGLE_LABELS: Record<LayerToggle, string> = {
  wells: 'Wells',
  wellNames: 'Well names',
  prospects: 'Prospects',
  plannedWells: 'Planned wells',
  offsets: 'Offset highlights',
};

export const DEFAULT_TOGGLES: LayerToggles = {
  wells: true,
  wellNames: true,
  prospects: true,
  plannedWells: true,
  offsets: true,
};

/**
 * Toggles from their stored JSON; unknown or garbled entries fall back to the default, one switch at a time.
 * @example readToggles('{"wellNames":false}').wellNames // false
 */
export function readToggles(stored: string | null): LayerToggles {
  let raw: Record<string, unknown> = {};
  try {
    const parsed: unknown = stored ? JSON.parse(stored) : {};
    if (parsed && typeof parsed === 'object') raw = parsed as Record<string, unknown>;
  } catch {
    // A garbled value is forgotten, not an error.
  }
  const result = { ...DEFAULT_TOGGLES };
  for (const key of LAYER_TOGGLES) if (typeof raw[key] === 'boolean') result[key] = raw[key];
  return result;
}
