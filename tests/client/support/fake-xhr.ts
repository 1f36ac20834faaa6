/** A stand-in for XMLHttpRequest that the test drives: progress, then an answer. */
export class FakeXhr {
  static made: FakeXhr[] = [];
  method = '';
  url = '';
  headers: Record<string, string> = {};
  body: unknown;
  status = 0;
  responseText = '';
  private listeners: Record<string, (() => void)[]> = {};
  private uploadListeners: Record<string, ((event: ProgressEvent) => void)[]> = {};
  readonly upload = {
    addEventListener: (type: string, listener: (event: ProgressEvent) => void) => {
      (this.uploadListeners[type] ??= []).push(listener);
    },
  };

  constructor() {
    FakeXhr.made.push(this);
  }

  open(method: string, url: string): void {
    this.method = method;
    this.url = url;
  }

  setRequestHeader(name: string, value: string): void {
    this.headers[name] = value;
  }

  addEventListener(type: string, listener: () => void): void {
    (this.listeners[type] ??= []).push(listener);
  }

  send(body: unknown): void {
    this.body = body;
  }

  abort(): void {
    this.listeners.abort?.forEach((l) => l());
  }

  getResponseHeader(): string | null {
    return null;
  }

  /** The browser reports `loaded` of `total` bytes sent. */
  progress(loaded: number, total: number): void {
    const event = { lengthComputable: true, loaded, total } as ProgressEvent;
    this.uploadListeners.progress?.forEach((l) => l(event));
  }

  /** The server answers with JSON. */
  answer(status: number, body: unknown): void {
    this.status = status;
    this.responseText = JSON.stringify(body);
    this.listeners.load?.forEach((l) => l());
  }
}
