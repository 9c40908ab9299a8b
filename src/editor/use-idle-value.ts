import { onBeforeUnmount, shallowRef, watch, type ShallowRef } from 'vue';

/**
 * `source()` as of the browser's next idle moment: for what may lag an edit by a frame or two (the small views,
 * the 3D preview), so the work of redrawing them never sits between an input and the main view's next paint.
 */
export function useIdleValue<T>(source: () => T): Readonly<ShallowRef<T>> {
  const value = shallowRef(source());
  const idle = typeof requestIdleCallback === 'function';
  let handle: number | ReturnType<typeof setTimeout> | null = null;
  const update = () => {
    handle = null;
    value.value = source();
  };
  watch(source, () => {
    if (handle !== null) return;
    handle = idle ? requestIdleCallback(update, { timeout: 300 }) : setTimeout(update, 16);
  });
  onBeforeUnmount(() => {
    if (handle === null) return;
    if (idle) cancelIdleCallback(handle as number);
    else clearTimeout(handle as ReturnType<typeof setTimeout>);
  });
  return value;
}
