import type {
  AttachmentView,
  CreateOrderRequest,
  CustomProfileView,
  CuttingState,
  ImportResult,
  Offcut,
  OrderDetail,
  OrderSummary,
  OutboxList,
  SendPreview,
  Supplier,
  SupplierInput,
} from '@shared/api/shop';
import { CSRF_HEADER, type ProjectSummary } from '@shared/api';
import { ApiError } from '@/api';
import { errorFromResponse } from '@/api/http';
import { useSessionStore } from '@/stores/session';

// The shop pages' calls: JSON like the rest of the app, plus multipart uploads (CSV imports, attachments, project
// files), with the session's CSRF token and the app's error type. Replies are the shapes in shared/api/shop.ts.

type Method = 'GET' | 'POST' | 'PATCH' | 'DELETE';

export function useShopApi() {
  const session = useSessionStore();

  async function call<T>(method: Method, path: string, body?: unknown, form?: FormData, retried = false): Promise<T> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    if (method !== 'GET' && session.csrfToken) headers[CSRF_HEADER] = session.csrfToken;
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    let res: Response;
    try {
      res = await fetch(`/api${path}`, { method, headers, credentials: 'same-origin', body: form ?? (body === undefined ? undefined : JSON.stringify(body)) });
    } catch {
      throw new ApiError(0, 'network', 'Cannot reach the server. Check the connection and try again.');
    }
    if (!res.ok) {
      const err = await errorFromResponse(res);
      if (err.code === 'csrf' && !retried) {
        await session.refreshCsrfToken();
        return call<T>(method, path, body, form, true);
      }
      throw err;
    }
    if (res.status === 204) return undefined as T;
    return (await res.json()) as T;
  }

  const upload = <T>(path: string, file: File): Promise<T> => {
    const form = new FormData();
    form.append('file', file);
    return call<T>('POST', path, undefined, form);
  };

  return {
    projectFiles: {
      /** A project file as a new project of the workshop. */
      import: (workshopId: string, file: File) => upload<ProjectSummary>(`/workshops/${workshopId}/projects/import`, file),
    },
    suppliers: {
      list: (workshopId: string) => call<Supplier[]>('GET', `/workshops/${workshopId}/suppliers`),
      create: (workshopId: string, body: SupplierInput) => call<Supplier>('POST', `/workshops/${workshopId}/suppliers`, body),
      update: (id: string, body: Partial<SupplierInput>) => call<Supplier>('PATCH', `/suppliers/${id}`, body),
      remove: (id: string) => call<void>('DELETE', `/suppliers/${id}`),
    },
    orders: {
      list: (workshopId: string) => call<OrderSummary[]>('GET', `/workshops/${workshopId}/orders`),
      get: (id: string) => call<OrderDetail>('GET', `/orders/${id}`),
      create: (workshopId: string, body: CreateOrderRequest) => call<OrderDetail>('POST', `/workshops/${workshopId}/orders`, body),
      sendPreview: (id: string) => call<SendPreview>('GET', `/orders/${id}/send-preview`),
      send: (id: string) => call<OrderDetail>('POST', `/orders/${id}/send`),
      received: (id: string) => call<OrderDetail>('PATCH', `/orders/${id}`, { status: 'received' }),
      remove: (id: string) => call<void>('DELETE', `/orders/${id}`),
    },
    cutting: {
      get: (frameId: string) => call<CuttingState>('GET', `/frames/${frameId}/cutting`),
      start: (frameId: string, restart = false) => call<CuttingState>('POST', `/frames/${frameId}/cutting`, { restart }),
      tick: (frameId: string, cutKey: string) => call<CuttingState>('POST', `/frames/${frameId}/cutting/ticks`, { cutKey }),
      untick: (frameId: string, cutKey: string) => call<CuttingState>('DELETE', `/frames/${frameId}/cutting/ticks?cutKey=${encodeURIComponent(cutKey)}`),
    },
    stock: {
      offcuts: (workshopId: string) => call<Offcut[]>('GET', `/workshops/${workshopId}/offcuts`),
      importOffcuts: (workshopId: string, file: File) => upload<ImportResult>(`/workshops/${workshopId}/offcuts/import`, file),
      removeOffcut: (workshopId: string, id: string) => call<void>('DELETE', `/workshops/${workshopId}/offcuts/${id}`),
      profiles: (workshopId: string) => call<CustomProfileView[]>('GET', `/workshops/${workshopId}/custom-profiles`),
      importProfiles: (workshopId: string, file: File) => upload<ImportResult>(`/workshops/${workshopId}/custom-profiles/import`, file),
    },
    attachments: {
      list: (projectId: string) => call<AttachmentView[]>('GET', `/projects/${projectId}/attachments`),
      add: (projectId: string, file: File) => upload<AttachmentView>(`/projects/${projectId}/attachments`, file),
      remove: (id: string) => call<void>('DELETE', `/attachments/${id}`),
      share: (id: string, sharedWithClient: boolean) => call<AttachmentView>('PATCH', `/attachments/${id}`, { sharedWithClient }),
    },
    outbox: (workshopId: string) => call<OutboxList>('GET', `/workshops/${workshopId}/outbox`),
  };
}
export type ShopApi = ReturnType<typeof useShopApi>;

/** Where a frame's printed documents and CSV files are downloaded from. */
export function frameDocUrl(frameId: string, doc: string, query: Record<string, string> = {}): string {
  const q = new URLSearchParams(query).toString();
  return `/api/frames/${frameId}/shop/${doc}${q ? `?${q}` : ''}`;
}

/** Where a project's file (everything in it, to import elsewhere) is downloaded from. */
export function projectExportUrl(projectId: string): string {
  return `/api/projects/${projectId}/export`;
}
