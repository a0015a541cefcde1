/** Browser-side calls to /api/v1 with the API's error shape turned into a typed error. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: { path: string; message: string }[] = [],
  ) {
    super(message);
  }
}

export async function api<T>(path: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  const response = await fetch(path, {
    ...rest,
    headers: { ...(json !== undefined ? { "content-type": "application/json" } : {}), ...headers },
    body: json !== undefined ? JSON.stringify(json) : rest.body,
  });
  if (response.status === 204) return undefined as T;
  const body: unknown = await response.json().catch(() => null);
  if (!response.ok) {
    const error = (body as { error?: { code?: string; message?: string; issues?: { path: string; message: string }[] } })
      ?.error;
    throw new ApiError(response.status, error?.code ?? "error", error?.message ?? "Request failed.", error?.issues);
  }
  return body as T;
}

/** Applies an API 422's field issues to a react-hook-form instance. */
export function applyIssues(error: unknown, setError: (path: never, error: { message: string }) => void): string {
  if (error instanceof ApiError) {
    for (const issue of error.issues) setError(issue.path as never, { message: issue.message });
    return error.message;
  }
  return "Something went wrong. Check your connection and try again.";
}
