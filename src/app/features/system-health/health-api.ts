import { HttpClient, HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { HealthReport } from '@shared/health/health-report';
import { withoutErrorNotice } from '../../core/error-notice-context';

function looksLikeReport(body: unknown): body is HealthReport {
  return typeof body === 'object' && body !== null && 'checks' in body && 'status' in body;
}

/** Reads `GET /api/health/details` (admins). */
@Injectable({ providedIn: 'root' })
export class HealthApi {
  private readonly http = inject(HttpClient);

  /** A degraded server may answer with an error status and the report as its body. */
  async fetchReport(): Promise<HealthReport> {
    try {
      return await firstValueFrom(
        this.http.get<HealthReport>('/api/health/details', { context: withoutErrorNotice() }),
      );
    } catch (error) {
      if (error instanceof HttpErrorResponse && looksLikeReport(error.error)) return error.error;
      throw error;
    }
  }
}
