// Calls to the board's JSON API. Every call can be cancelled: starting a new one of the same kind
// aborts the one before (the server stops its search when the request goes away).

export class ApiError extends Error {
  constructor(status, body) {
    super(body?.error ?? `request failed (${status})`);
    this.status = status;
    this.body = body ?? {};
  }
}

export async function get(path) {
  const response = await fetch(path);
  const body = await response.json();
  if (!response.ok) throw new ApiError(response.status, body);
  return body;
}

export async function post(path, data, signal) {
  const response = await fetch(path, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify(data),
    signal,
  });
  let body = null;
  try { body = await response.json(); } catch { body = null; }
  if (!response.ok) throw new ApiError(response.status, body);
  return body;
}

/** One request at a time per slot: a new call aborts the previous one. */
export class Slot {
  #controller = null;
  async post(path, data) {
    this.cancel();
    const controller = new AbortController();
    this.#controller = controller;
    try {
      return await post(path, data, controller.signal);
    } finally {
      if (this.#controller === controller) this.#controller = null;
    }
  }
  cancel() { this.#controller?.abort(); this.#controller = null; }
  get busy() { return this.#controller !== null; }
}

export const isAbort = e => e?.name === 'AbortError';

/** The caret under bad notation, as the command line shows it. */
export function caret(error) {
  const b = error.body ?? {};
  if (!b.column || b.text == null) return null;
  return `${b.text}\n${' '.repeat(Math.max(0, b.column - 1))}^ expected ${b.expected}`;
}
