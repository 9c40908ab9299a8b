import { ref, watch } from 'vue';
import { defineStore } from 'pinia';

export type LengthUnit = 'mm' | 'in';
/** Finest fraction of an inch shown: 1/16 or 1/32. */
export type InchFraction = 16 | 32;

export interface Preferences {
  units: LengthUnit;
  fraction: InchFraction;
  /** Draw the drawer boxes, panels and countertop in the editor's views. */
  showSheetGoods: boolean;
}

const STORAGE_KEY = 'slotwright.preferences';
export const DEFAULT_PREFERENCES: Readonly<Preferences> = { units: 'mm', fraction: 16, showSheetGoods: true };

/** Reads stored preferences, keeping only values that are still valid. */
export function parsePreferences(text: string | null): Preferences {
  const result: Preferences = { ...DEFAULT_PREFERENCES };
  if (!text) return result;
  try {
    const raw = JSON.parse(text) as Record<string, unknown>;
    if (raw.units === 'mm' || raw.units === 'in') result.units = raw.units;
    if (raw.fraction === 16 || raw.fraction === 32) result.fraction = raw.fraction;
    if (typeof raw.showSheetGoods === 'boolean') result.showSheetGoods = raw.showSheetGoods;
  } catch {
    // A damaged entry falls back to the defaults.
  }
  return result;
}

function readStored(): string | null {
  try {
    return localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

/** Per-browser display choices, kept in localStorage. Lengths are millimetres everywhere else. */
export const usePreferencesStore = defineStore('preferences', () => {
  const initial = parsePreferences(readStored());
  const units = ref<LengthUnit>(initial.units);
  const fraction = ref<InchFraction>(initial.fraction);
  const showSheetGoods = ref<boolean>(initial.showSheetGoods);

  watch([units, fraction, showSheetGoods], () => {
    try {
      localStorage.setItem(STORAGE_KEY, JSON.stringify({ units: units.value, fraction: fraction.value, showSheetGoods: showSheetGoods.value }));
    } catch {
      // Storage refused: the choice lasts for this page only.
    }
  });

  return { units, fraction, showSheetGoods };
});
