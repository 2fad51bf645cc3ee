/**
 * A tiny browser stand-in over fetch for the sign-in flow: follows redirects by hand and keeps
 * cookies as a browser does. Cookies belong to a host and ignore ports, so the app and the identity
 * provider (both on 127.0.0.1, on different ports) see each other's cookies, exactly as in a real
 * browser; that is why the app's cookie has a name of its own.
 */
interface StoredCookie {
  name: string;
  value: string;
  host: string;
  path: string;
}

/** One page or response the stand-in ended on. */
export interface Visit {
  url: string;
  status: number;
  body: string;
  headers: Headers;
}

export interface RequestOptions {
  method?: string;
  body?: string | URLSearchParams;
  headers?: Record<string, string>;
  /** Stop before requesting a redirect target that matches (its URL is then in `stoppedAt`). */
  stopBefore?: (url: URL) => boolean;
}

const redirectStatuses = new Set([301, 302, 303, 307, 308]);

/** The absolute URL a page's (only) form posts to. */
export function formAction(page: Visit): string {
  const action = /<form[^>]*\saction="([^"]+)"/.exec(page.body)?.[1];
  if (!action) throw new Error(`No form on ${page.url}`);
  return new URL(action.replace(/&amp;/g, '&'), page.url).href;
}

export class BrowserlessBrowser {
  private cookies: StoredCookie[] = [];
  /** Every URL requested, in order, redirects included. */
  readonly trail: string[] = [];
  /** The redirect target that `stopBefore` held back, if any. */
  stoppedAt?: string;

  /** Another browser holding a copy of this one's cookies (a stolen cookie jar). */
  clone(): BrowserlessBrowser {
    const copy = new BrowserlessBrowser();
    copy.cookies = this.cookies.map((cookie) => ({ ...cookie }));
    return copy;
  }

  cookie(url: string, name: string): string | undefined {
    const target = new URL(url);
    return this.cookies.find((c) => c.name === name && this.applies(c, target))?.value;
  }

  /** Requests a URL and follows redirects (at most 20), as a top-level navigation would. */
  async open(url: string, options: RequestOptions = {}): Promise<Visit> {
    let target = new URL(url);
    let method = options.method ?? 'GET';
    let body = options.body;
    this.stoppedAt = undefined;
    for (let hop = 0; hop < 20; hop += 1) {
      const response = await this.send(target, method, body, options.headers);
      const location = response.headers.get('location');
      if (!redirectStatuses.has(response.status) || !location) {
        return {
          url: target.href,
          status: response.status,
          body: await response.text(),
          headers: response.headers,
        };
      }
      await response.arrayBuffer();
      const next = new URL(location, target);
      if (options.stopBefore?.(next)) {
        this.stoppedAt = next.href;
        return { url: target.href, status: response.status, body: '', headers: response.headers };
      }
      if (response.status !== 307 && response.status !== 308) {
        method = 'GET';
        body = undefined;
      }
      target = next;
    }
    throw new Error(`More than 20 redirects starting at ${url}`);
  }

  /** Submits the page's only form with the given fields, the way pressing its button would. */
  submitForm(page: Visit, fields: Record<string, string>, stopBefore?: (url: URL) => boolean) {
    return this.open(formAction(page), {
      method: 'POST',
      body: new URLSearchParams(fields),
      stopBefore,
    });
  }

  private async send(target: URL, method: string, body: RequestOptions['body'], headers = {}) {
    this.trail.push(target.href);
    const cookieHeader = this.cookies
      .filter((c) => this.applies(c, target))
      .map((c) => `${c.name}=${c.value}`)
      .join('; ');
    const response = await fetch(target, {
      method,
      body,
      redirect: 'manual',
      headers: { ...(cookieHeader ? { cookie: cookieHeader } : {}), ...headers },
    });
    for (const line of response.headers.getSetCookie()) this.store(target, line);
    return response;
  }

  private applies(cookie: StoredCookie, target: URL): boolean {
    return cookie.host === target.hostname && target.pathname.startsWith(cookie.path);
  }

  private store(origin: URL, line: string): void {
    const [pair = '', ...attributes] = line.split(';').map((part) => part.trim());
    const equals = pair.indexOf('=');
    const name = pair.slice(0, equals);
    const value = pair.slice(equals + 1);
    const attribute = (key: string) =>
      attributes.find((a) => a.toLowerCase().startsWith(`${key}=`))?.slice(key.length + 1);
    const path = attribute('path') || origin.pathname.replace(/\/[^/]*$/, '') || '/';
    const maxAge = attribute('max-age');
    const expires = attribute('expires');
    const expired =
      (maxAge !== undefined && Number(maxAge) <= 0) ||
      (expires !== undefined && Date.parse(expires) <= Date.now());
    this.cookies = this.cookies.filter(
      (c) => !(c.name === name && c.host === origin.hostname && c.path === path),
    );
    if (!expired) this.cookies.push({ name, value, host: origin.hostname, path });
  }
}

/** Starts at the app's sign-in and stops on the provider's sign-in page. */
export async function openProviderSignIn(
  browser: BrowserlessBrowser,
  appUrl: string,
): Promise<Visit> {
  const page = await browser.open(`${appUrl}/auth/sign-in`);
  if (page.status !== 200 || !page.body.includes('<form')) {
    throw new Error(`Expected the provider's sign-in form, got ${page.status} at ${page.url}`);
  }
  return page;
}

/** Signs in through the provider with e-mail and password; returns the page the browser lands on. */
export async function signInThroughProvider(
  browser: BrowserlessBrowser,
  appUrl: string,
  email: string,
  password: string,
  stopBefore?: (url: URL) => boolean,
): Promise<Visit> {
  const form = await openProviderSignIn(browser, appUrl);
  return browser.submitForm(form, { email, password }, stopBefore);
}

/** A JSON API call from this browser (cookies included), e.g. `GET /api/session`. */
export async function apiCall(
  browser: BrowserlessBrowser,
  url: string,
  init: { method?: string; csrfToken?: string; json?: unknown } = {},
): Promise<{ status: number; body: unknown }> {
  const headers: Record<string, string> = { accept: 'application/json' };
  if (init.csrfToken) headers['x-csrf-token'] = init.csrfToken;
  if (init.json !== undefined) headers['content-type'] = 'application/json';
  const visit = await browser.open(url, {
    method: init.method ?? 'GET',
    body: init.json === undefined ? undefined : JSON.stringify(init.json),
    headers,
  });
  const isJson = visit.headers.get('content-type')?.includes('json') ?? false;
  return {
    status: visit.status,
    body: isJson && visit.body ? (JSON.parse(visit.body) as unknown) : visit.body,
  };
}
