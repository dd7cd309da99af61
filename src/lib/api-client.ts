import { fieldLabelOf } from '@shared/contracts/field-labels';
/** The error shape every API answer uses; the client turns it into a typed error and never acts on it itself. */
export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string>; labels?: Record<string, string> };
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
    /** Each field's label on screen, as the server named it. */
    readonly labels: Record<string, string> = {},
  ) {
    super(message);
  }

  /** The label of a field the server named, for a message shown away from the field itself. */
  labelOf(path: string): string {
    return this.labels[path] ?? fieldLabelOf(path);
  }
}

type Query = Record<string, string | number | boolean | undefined | null | string[]>;

export function withQuery(path: string, query?: Query) {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value === undefined || value === null || value === '') continue;
    if (Array.isArray(value)) value.forEach((v) => params.append(key, v));
    else params.set(key, String(value));
  }
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function request<T>(
  method: string,
  path: string,
  body?: unknown,
  query?: Query,
  extra: Record<string, string> = {},
): Promise<T> {
  const response = await fetch(withQuery(path, query), {
    method,
    credentials: 'same-origin',
    headers:
      body === undefined
        ? { Accept: 'application/json', ...extra }
        : { Accept: 'application/json', 'Content-Type': 'application/json', ...extra },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (response.status === 204) return undefined as T;
  const text = await response.text();
  const data: unknown = text ? safeJson(text) : undefined;
  if (!response.ok) {
    const err = (data as ApiErrorBody | undefined)?.error;
    throw new ApiError(
      response.status,
      err?.code ?? 'http_error',
      err?.message ?? `The server answered ${response.status}.`,
      err?.fields,
      err?.labels,
    );
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

export const api = {
  get: <T>(path: string, query?: Query) => request<T>('GET', path, undefined, query),
  post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}),
  put: <T>(path: string, body?: unknown) => request<T>('PUT', path, body ?? {}),
  patch: <T>(path: string, body?: unknown) => request<T>('PATCH', path, body ?? {}),
  delete: <T>(path: string) => request<T>('DELETE', path),
  /** The same client for a page that proves itself with a header rather than a session (the inspector's link). */
  withHeaders: (headers: Record<string, string>) => ({
    get: <T>(path: string) => request<T>('GET', path, undefined, undefined, headers),
    post: <T>(path: string, body?: unknown) => request<T>('POST', path, body ?? {}, undefined, headers),
  }),
};
