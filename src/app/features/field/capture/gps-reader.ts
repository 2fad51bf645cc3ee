import { Injectable } from '@angular/core';
import { Observable } from 'rxjs';

/** One position from the device: where, how sure (metres), and when. */
export interface PositionFix {
  readonly latitude: number;
  readonly longitude: number;
  readonly accuracyMetres: number;
  readonly capturedAt: string;
}

export type GpsProblem = 'denied' | 'unavailable' | 'timeout' | 'unsupported';

/** A fix, or why there is none in words the enumerator can act on. */
export type GpsReading =
  | { readonly ok: true; readonly fix: PositionFix }
  | { readonly ok: false; readonly problem: GpsProblem; readonly message: string };

const messages: Record<GpsProblem, string> = {
  denied:
    'Location is turned off for Fieldcurve. Allow it in the browser settings, then try again.',
  unavailable: 'The device cannot find its position here. Step outside or near a window.',
  timeout: 'No position yet. Wait a moment in the open, then try again.',
  unsupported: 'This browser cannot give a position.',
};

/** The GPS of the device through `navigator.geolocation`, with denial and time-outs explained. */
@Injectable({ providedIn: 'root' })
export class GpsReader {
  /**
   * One fresh fix, waiting at most `timeoutMs`; never rejects. No cached position is taken:
   * the enumerator may have walked to the next point since the last one.
   */
  readOnce(timeoutMs = 20_000): Promise<GpsReading> {
    const geolocation = globalThis.navigator?.geolocation;
    if (!geolocation) return Promise.resolve(failure('unsupported'));
    return new Promise((resolve) =>
      geolocation.getCurrentPosition(
        (position) => resolve({ ok: true, fix: fixOf(position) }),
        (error) => resolve(failure(problemOf(error))),
        { enableHighAccuracy: true, timeout: timeoutMs, maximumAge: 0 },
      ),
    );
  }

  /** Fixes as they improve, until unsubscribed; a failure ends the stream with a reading. */
  watch(): Observable<GpsReading> {
    return new Observable<GpsReading>((subscriber) => {
      const geolocation = globalThis.navigator?.geolocation;
      if (!geolocation) {
        subscriber.next(failure('unsupported'));
        subscriber.complete();
        return undefined;
      }
      const id = geolocation.watchPosition(
        (position) => subscriber.next({ ok: true, fix: fixOf(position) }),
        (error) => subscriber.next(failure(problemOf(error))),
        { enableHighAccuracy: true, timeout: 60_000, maximumAge: 0 },
      );
      return () => geolocation.clearWatch(id);
    });
  }
}

function fixOf(position: GeolocationPosition): PositionFix {
  return {
    latitude: position.coords.latitude,
    longitude: position.coords.longitude,
    accuracyMetres: Math.round(position.coords.accuracy * 10) / 10,
    capturedAt: new Date(position.timestamp).toISOString(),
  };
}

function problemOf(error: GeolocationPositionError): GpsProblem {
  if (error.code === error.PERMISSION_DENIED) return 'denied';
  if (error.code === error.TIMEOUT) return 'timeout';
  return 'unavailable';
}

function failure(problem: GpsProblem): GpsReading {
  return { ok: false, problem, message: messages[problem] };
}
