// Node has no XMLHttpRequest, which the browser client (`uploadthing/client`
// `uploadWithProgress`) uses for the presigned PUT. This shim sends the same
// request with fetch: method, URL, headers and FormData body exactly as the
// client builds them; only upload-progress events are not emitted.
type Listener = () => void;

export class FetchBackedXhr {
  status = 0;
  statusText = '';
  response: unknown = null;
  responseType = '';
  readonly upload = { addEventListener: (_type: string, _listener: unknown) => {} };
  private method = 'GET';
  private url = '';
  private readonly headers = new Headers();
  private readonly listeners = new Map<string, Listener[]>();
  private readonly controller = new AbortController();

  open(method: string, url: string): void {
    this.method = method;
    this.url = url;
  }

  setRequestHeader(name: string, value: string): void {
    this.headers.set(name, value);
  }

  addEventListener(type: string, listener: Listener): void {
    this.listeners.set(type, [...(this.listeners.get(type) ?? []), listener]);
  }

  abort(): void {
    this.controller.abort();
  }

  private emit(type: string): void {
    for (const listener of this.listeners.get(type) ?? []) listener();
  }

  send(body: FormData): void {
    fetch(this.url, { method: this.method, headers: this.headers, body, signal: this.controller.signal }).then(
      async (res) => {
        this.status = res.status;
        this.statusText = res.statusText;
        const text = await res.text();
        try {
          this.response = this.responseType === 'json' ? JSON.parse(text) : text;
        } catch {
          this.response = null;
        }
        this.emit('load');
      },
      () => this.emit('error'),
    );
  }
}

export function installXhrShim(): () => void {
  const g = globalThis as { XMLHttpRequest?: unknown };
  const previous = g.XMLHttpRequest;
  g.XMLHttpRequest = FetchBackedXhr;
  return () => {
    g.XMLHttpRequest = previous;
  };
}
