import { computed } from 'vue';
import { storeToRefs } from 'pinia';
import { formatLength } from '@shared/geometry/units';
import { usePreferencesStore } from '@/stores/preferences';

/** Lengths as the builder chose to read them (mm, or inches to 1/16 or 1/32), everywhere in the editor. */
export function useLengthFormat() {
  const prefs = usePreferencesStore();
  const { units, fraction } = storeToRefs(prefs);
  const fmt = computed(() => {
    const u = units.value;
    const f = fraction.value;
    return (mm: number) => formatLength(mm, u, f);
  });
  return { fmt, unit: units, fraction };
}
