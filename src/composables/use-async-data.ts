import { computed, ref, shallowRef, toValue, watch, type MaybeRefOrGetter, type Ref } from 'vue';
import { ApiError } from '@/api';

function asApiError(error: unknown): ApiError {
  if (error instanceof ApiError) return error;
  return new ApiError(0, 'client', error instanceof Error ? error.message : 'Something went wrong.');
}

export interface AsyncData<T> {
  data: Ref<T | null>;
  loading: Ref<boolean>;
  error: Ref<ApiError | null>;
  reload: () => Promise<void>;
}

/**
 * Server data with loading and error state. `key` (for example a route id) reloads the data when it changes; a
 * reply that arrives after a newer request started is dropped, so fast navigation never shows the wrong record.
 */
export function useAsyncData<T, K>(key: MaybeRefOrGetter<K>, load: (key: K) => Promise<T>): AsyncData<T> {
  const data = shallowRef<T | null>(null) as Ref<T | null>;
  const loading = ref(false);
  const error = shallowRef<ApiError | null>(null);
  let latest = 0;

  async function reload(): Promise<void> {
    const ticket = ++latest;
    loading.value = true;
    error.value = null;
    try {
      const result = await load(toValue(key));
      if (ticket === latest) data.value = result;
    } catch (caught) {
      if (ticket === latest) error.value = asApiError(caught);
    } finally {
      if (ticket === latest) loading.value = false;
    }
  }

  watch(
    () => toValue(key),
    (next, previous) => {
      if (next !== previous) data.value = null;
      void reload();
    },
    { immediate: true },
  );

  return { data, loading, error, reload };
}

export interface Action<A extends unknown[], R> {
  /** Runs the call; resolves to its result, or to undefined when it failed (the failure is in `error`). */
  run: (...args: A) => Promise<R | undefined>;
  pending: Ref<boolean>;
  error: Ref<ApiError | null>;
  /** Server messages by request field, for form fields' error-messages. */
  fieldErrors: Readonly<Ref<Readonly<Record<string, string>>>>;
  /** The error's message when no field shows it. */
  formError: Readonly<Ref<string | null>>;
  reset: () => void;
}

/** A state-changing call (create, rename, delete…) with pending and error state for the form that starts it. */
export function useAction<A extends unknown[], R>(call: (...args: A) => Promise<R>): Action<A, R> {
  const pending = ref(false);
  const error = shallowRef<ApiError | null>(null);

  async function run(...args: A): Promise<R | undefined> {
    pending.value = true;
    error.value = null;
    try {
      return await call(...args);
    } catch (caught) {
      error.value = asApiError(caught);
      return undefined;
    } finally {
      pending.value = false;
    }
  }

  const fieldErrors = computed(() => error.value?.fields ?? {});
  const formError = computed(() => (error.value && !error.value.hasFieldErrors ? error.value.message : null));

  return {
    run,
    pending,
    error,
    fieldErrors,
    formError,
    reset: () => {
      error.value = null;
    },
  };
}
