import { ref, watch } from 'vue';
import { defineStore } from 'pinia';

/** What the editor's views draw beside the members: a per-browser choice, unlike units, which the frame owns. */
export interface ViewOptions {
  /** Draw the drawer boxes, panels and countertop in the editor's views. */
  showSheetGoods: boolean;
}

const STORAGE_KEY = 'slotwright.view-options';
export const DEFAULT_VIEW_OPTIONS: Readonly<ViewOptions> = { showSheetGoods: true };

/** Reads stored options, keeping only values that are still valid. */
export function parseViewOptions(text: string | null): ViewOptions {
  const result: ViewOptions = { ...DEFAULT_VIEW_OPTIONS };
  if (!text) return result;
  try {
    const raw = JSON.parse(text) as Record<string, unknown>;
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

export const useViewOptionsStore = defineStore('view-options', () => {
  const showSheetGoods = ref<boolean>(parseViewOptions(readStored()).showSheetGoods);
  watch(showSheetGoods, () => {
    try {
      localStorage.setItem(STORAGE_KEY, JSON.stringify({ showSheetGoods: showSheetGoods.value }));
    } catch {
      // Storage refused: the choice lasts for this page only.
    }
  });
  return { showSheetGoods };
});
