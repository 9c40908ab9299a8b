import { onBeforeUnmount, onMounted, ref, type Ref } from 'vue';

/**
 * True once the page has painted a frame after the component mounted: what can wait (the results panels, the
 * 3D preview) mounts then, so opening a large frame shows its drawing first. The canvas draws in its first
 * animation frame; the second one runs after that frame was painted.
 */
export function useAfterFirstDraw(): Ref<boolean> {
  const ready = ref(false);
  let handle = 0;
  onMounted(() => {
    if (typeof requestAnimationFrame === 'undefined') {
      ready.value = true;
      return;
    }
    handle = requestAnimationFrame(() => {
      handle = requestAnimationFrame(() => {
        // After the paint, as its own task: the mounting must not delay the frame just drawn.
        handle = 0;
        setTimeout(() => (ready.value = true), 0);
      });
    });
  });
  onBeforeUnmount(() => {
    if (handle) cancelAnimationFrame(handle);
  });
  return ready;
}
