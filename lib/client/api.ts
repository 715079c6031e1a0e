/**
 * The browser's side of the REST API: JSON in and out, and every failure as an {@link ApiError} carrying the
 * server's code, message and field errors so forms can show them beside their inputs.
 */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function api<T>(path: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(path, {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers: init.body === undefined ? undefined : { "content-type": "application/json" },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "Fadeline could not be reached. Check your connection and try again.");
  }
  if (response.status === 204) return undefined as T;
  const payload = (await response.json().catch(() => null)) as
    | { error?: { code: string; message: string; fields?: Record<string, string[]> } }
    | null;
  if (!response.ok) {
    const e = payload?.error;
    throw new ApiError(response.status, e?.code ?? "internal", e?.message ?? `The server answered ${response.status}.`, e?.fields);
  }
  return payload as T;
}

/** Copies server field errors onto a react-hook-form form. */
export function applyFieldErrors(
  error: unknown,
  setError: (name: never, value: { type: string; message: string }) => void,
): boolean {
  if (!(error instanceof ApiError) || Object.keys(error.fields).length === 0) return false;
  for (const [name, messages] of Object.entries(error.fields)) {
    setError(name as never, { type: "server", message: messages[0] ?? "Check this field." });
  }
  return true;
}
