import { computed } from 'vue';
import { storeToRefs } from 'pinia';
import { lengthText, massText } from '@shared/display/format';
import { usePreferencesStore } from '@/stores/preferences';

/** Lengths and masses as the frame (or its workshop) reads them: mm or inches to 1/16 or 1/32, kg or lb. */
export function useLengthFormat() {
  const prefs = usePreferencesStore();
  const { units, fraction, decimalComma } = storeToRefs(prefs);
  const fmt = computed(() => {
    const r = prefs.active;
    return (mm: number) => lengthText(mm, r);
  });
  const fmtMass = computed(() => {
    const r = prefs.active;
    return (kg: number) => massText(kg, r);
  });
  return { fmt, fmtMass, unit: units, fraction, decimalComma };
}
