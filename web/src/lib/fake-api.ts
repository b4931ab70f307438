/** One request the app made to the fake API. */
export interface FakeCall {
  method: string;
  path: string;
  body: unknown;
}

export type FakeAnswer = { status: number; body?: unknown } | undefined;

/**
 * An API in memory for component tests: `answer` says what each request gets (undefined: 404), and every request
 * is logged. Install it with `vi.stubGlobal('fetch', api.fetch)`.
 */
export function fakeApi(answer: (call: FakeCall) => FakeAnswer | Promise<FakeAnswer>) {
  const calls: FakeCall[] = [];
  const fetch = async (input: RequestInfo | URL, init?: RequestInit): Promise<Response> => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url, 'http://app.test');
    const call = { method: init?.method ?? 'GET', path: url.pathname + url.search, body: typeof init?.body === 'string' ? JSON.parse(init.body) : undefined };
    calls.push(call);
    const a = (await answer(call)) ?? { status: 404, body: { statusCode: 404, message: `No fake answer for ${call.method} ${call.path}` } };
    return new Response(a.body === undefined ? null : JSON.stringify(a.body), { status: a.status, headers: { 'content-type': 'application/json' } });
  };
  return { calls, fetch };
}
