import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { csrfHeaderName } from '@shared/auth/csrf-header';
import { signInAs } from '../testing/sign-in-as';
import { csrfInterceptor } from './csrf-interceptor';

describe('csrfInterceptor', () => {
  let http: HttpClient;
  let server: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [
        provideHttpClient(withInterceptors([csrfInterceptor])),
        provideHttpClientTesting(),
      ],
    });
    http = TestBed.inject(HttpClient);
    server = TestBed.inject(HttpTestingController);
  });

  afterEach(() => server.verify());

  function headerSentWith(method: string, url = '/api/things'): string | null {
    http.request(method, url, { body: method === 'GET' ? null : {} }).subscribe();
    const request = server.expectOne(url);
    request.flush({});
    return request.request.headers.get(csrfHeaderName);
  }

  it.each(['POST', 'PUT', 'PATCH', 'DELETE'])('adds the token to a %s request', async (method) => {
    const info = await signInAs(['admin']);
    expect(headerSentWith(method)).toBe(info.csrfToken);
  });

  it.each(['GET', 'HEAD', 'OPTIONS'])('leaves a %s request without the token', async (method) => {
    await signInAs(['admin']);
    expect(headerSentWith(method)).toBeNull();
  });

  it('never sends the token to another origin', async () => {
    await signInAs(['admin']);
    expect(headerSentWith('POST', 'https://elsewhere.example/api')).toBeNull();
    expect(headerSentWith('POST', '//elsewhere.example/api')).toBeNull();
  });

  it('sends no header while signed out', () => {
    expect(headerSentWith('POST')).toBeNull();
  });
});
