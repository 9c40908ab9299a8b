import { describe, expect, it } from 'vitest';
import { nextTick, ref } from 'vue';
import { ApiError } from '@/api/http';
import { useAction, useAsyncData } from '@/composables/use-async-data';

/** A promise with its resolve/reject handed out, to finish calls in a chosen order. */
function deferred<T>() {
  let resolve!: (value: T) => void;
  let reject!: (error: unknown) => void;
  const promise = new Promise<T>((res, rej) => {
    resolve = res;
    reject = rej;
  });
  return { promise, resolve, reject };
}

const flush = () => new Promise((r) => setTimeout(r, 0));

describe('useAsyncData', () => {
  it('keeps the reply for the current key when an older one arrives late', async () => {
    const key = ref('frame-a');
    const pending = new Map<string, ReturnType<typeof deferred<string>>>();
    const { data, loading } = useAsyncData(key, (k) => {
      const d = deferred<string>();
      pending.set(k, d);
      return d.promise;
    });
    expect(loading.value).toBe(true);

    key.value = 'frame-b';
    await nextTick();
    pending.get('frame-b')!.resolve('B');
    await flush();
    pending.get('frame-a')!.resolve('A');
    await flush();

    expect(data.value).toBe('B');
    expect(loading.value).toBe(false);
  });

  it('exposes a failure as an ApiError and clears it on reload', async () => {
    let fail = true;
    const { data, error, reload } = useAsyncData('x', async () => {
      if (fail) throw new ApiError(403, 'forbidden', 'Not for viewers');
      return 42;
    });
    await flush();
    expect(error.value?.isForbidden).toBe(true);
    expect(data.value).toBeNull();

    fail = false;
    await reload();
    expect(error.value).toBeNull();
    expect(data.value).toBe(42);
  });
});

describe('useAction', () => {
  it('hands field messages to the form and other failures to one message', async () => {
    const action = useAction(async (name: string) => {
      if (!name) throw new ApiError(400, 'validation', 'Check the fields', { name: 'Must not be empty' });
      if (name === 'taken') throw new ApiError(409, 'conflict', 'That name is taken');
      return name.toUpperCase();
    });

    expect(await action.run('')).toBeUndefined();
    expect(action.fieldErrors.value).toEqual({ name: 'Must not be empty' });
    expect(action.formError.value).toBeNull();

    await action.run('taken');
    expect(action.fieldErrors.value).toEqual({});
    expect(action.formError.value).toBe('That name is taken');

    expect(await action.run('rail')).toBe('RAIL');
    expect(action.error.value).toBeNull();
    expect(action.pending.value).toBe(false);
  });
});
