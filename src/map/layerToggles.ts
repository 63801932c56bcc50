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

/** Switches of the uploaded reference layers, by layer id. A layer missing here is shown. */
export type ReferenceToggles = Record<string, boolean>;

const LAYER_ID = /^[0-9a-f-]{36}$/;

/**
 * Reference-layer switches from their stored JSON: only layer ids with a true/false value survive.
 * @example readReferenceToggles('{"0b6a3f0e-4a4b-4c1e-9d55-2f7c1c3c9a10":false,"x":true}') // { '0b6a…': false }
 */
export function readReferenceToggles(stored: string | null): ReferenceToggles {
  let parsed: unknown = null;
  try {
    parsed = stored ? JSON.parse(stored) : null;
  } catch {
    // A garbled value is forgotten, not an error.
  }
  const result: ReferenceToggles = {};
  if (!parsed || typeof parsed !== 'object' || Array.isArray(parsed)) return result;
  for (const [id, on] of Object.entries(parsed as Record<string, unknown>))
    if (LAYER_ID.test(id) && typeof on === 'boolean') result[id] = on;
  return result;
}

/**
 * Whether a reference layer is shown: as last switched, and on for a layer never switched (a fresh upload is visible).
 * @example referenceShown({}, id) // true
 */
export function referenceShown(toggles: ReferenceToggles, layerId: string): boolean {
  return toggles[layerId] ?? true;
}

/**
 * The switches after a layer is deleted: its entry goes, so storage does not fill with ids that are gone.
 * @example withoutReference({ a: false, b: true }, 'a') // { b: true }
 */
export function withoutReference(toggles: ReferenceToggles, layerId: string): ReferenceToggles {
  const { [layerId]: _gone, ...rest } = toggles;
  return rest;
}
