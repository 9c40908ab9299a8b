import { computed, ref, watch } from 'vue';
import { defineStore } from 'pinia';
import { DEFAULT_WORKSHOP_SETTINGS, type WorkshopSettings } from '@shared/api/workshop-settings';
import type { Readout } from '@shared/display/format';
import type { DateFormat } from '@shared/model/settings';
import { useApi } from '@/api';
import { useSessionStore } from './session';

export type LengthUnit = 'mm' | 'in';
/** Finest fraction of an inch shown: 1/16 or 1/32. */
export type InchFraction = 16 | 32;

/** How figures are read and typed: the open frame's own choice, else its workshop's. */
export type ReadoutChoice = Required<Readout> & { decimalComma: boolean };

export function workshopReadout(s: WorkshopSettings): ReadoutChoice {
  return { display: s.units.length, frac: s.units.frac, mass: s.units.mass, date: s.units.date, decimalComma: s.units.decimalComma };
}
export const DEFAULT_READOUT: Readonly<ReadoutChoice> = workshopReadout(DEFAULT_WORKSHOP_SETTINGS);

/**
 * Units and date format on screen. They come from the server, not the browser: the workshop's settings
 * (loaded for the chosen workshop), and inside the editor the open frame's own, which win — so the screen, the
 * printed saw list and the e-mails always read the same.
 */
export const usePreferencesStore = defineStore('preferences', () => {
  const api = useApi();
  const session = useSessionStore();
  const workshop = ref<ReadoutChoice>({ ...DEFAULT_READOUT });
  const workshopSettings = ref<WorkshopSettings>(DEFAULT_WORKSHOP_SETTINGS);
  const canEdit = ref(false);
  /** Set by the editor while a frame is open. */
  const frame = ref<ReadoutChoice | null>(null);
  const active = computed<ReadoutChoice>(() => frame.value ?? workshop.value);

  function apply(settings: WorkshopSettings, editable: boolean): void {
    workshopSettings.value = settings;
    workshop.value = workshopReadout(settings);
    canEdit.value = editable;
  }

  async function load(workshopId: string | null): Promise<void> {
    if (!workshopId) return apply(DEFAULT_WORKSHOP_SETTINGS, false);
    try {
      const view = await api.workshops.settings(workshopId);
      if (session.currentWorkshopId === workshopId) apply(view.settings, view.canEdit);
    } catch {
      // Not a member (a client's project) or offline: the built-in defaults until the frame says otherwise.
      apply(DEFAULT_WORKSHOP_SETTINGS, false);
    }
  }
  watch(
    () => session.currentWorkshopId,
    (id) => void load(id),
    { immediate: true },
  );

  const units = computed<LengthUnit>(() => active.value.display);
  const fraction = computed<InchFraction>(() => active.value.frac);
  const mass = computed<'kg' | 'lb'>(() => active.value.mass);
  const date = computed<DateFormat>(() => active.value.date);
  const decimalComma = computed<boolean>(() => active.value.decimalComma);

  return { workshop, workshopSettings, canEdit, frame, active, units, fraction, mass, date, decimalComma, apply, load };
});
