import { ref } from 'vue';
import { defineStore } from 'pinia';

export type NoticeKind = 'success' | 'info' | 'warning' | 'error';

export interface Notice {
  text: string;
  color: NoticeKind;
  timeout: number;
}

/** Short app-wide messages shown in the corner snackbar (saved, restored, refused…). */
export const useNoticesStore = defineStore('notices', () => {
  const queue = ref<Notice[]>([]);

  function notify(text: string, kind: NoticeKind = 'success'): void {
    queue.value.push({ text, color: kind, timeout: kind === 'error' || kind === 'warning' ? 8000 : 4000 });
  }

  return { queue, notify };
});
