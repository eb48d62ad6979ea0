import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';

/** GET /api/jobs: one line per accepted proposal. Money as decimal strings in `currency`. */
export interface JobListItem {
  readonly id: string;
  readonly title: string;
  readonly clientName: string;
  readonly optionLabel: string;
  readonly contractSum: string;
  readonly currency: string;
  readonly status: string;
  readonly startDate: string | null;
  readonly finishDate?: string | null;
  readonly createdAt: string;
}

/** One line of the draft payment schedule, frozen from the accepted option. */
export interface JobPayment {
  readonly id: string;
  readonly position: number;
  readonly label: string;
  readonly role: string;
  readonly percent: number | string | null;
  readonly amount: string;
  readonly expectedOn: string | null;
  readonly status: string;
  /** present when the API passes the proposal's trigger through */
  readonly trigger?: { readonly kind: string } | null;
}

export interface JobView {
  readonly id: string;
  readonly title: string;
  readonly clientName: string;
  readonly clientId?: string;
  /** not every API version sends the address; the site id then links to the site's page */
  readonly siteAddress?: string | readonly string[] | null;
  readonly siteId?: string;
  readonly optionLabel: string;
  readonly contractSum: string;
  readonly currency: string;
  readonly status: string;
  readonly startDate: string | null;
  readonly finishDate: string | null;
  readonly proposalVersionId: string;
  readonly estimateId: string;
  readonly paymentSchedule: readonly JobPayment[];
}

@Injectable({ providedIn: 'root' })
export class JobApi {
  private readonly http = inject(HttpClient);

  async list(): Promise<readonly JobListItem[]> {
    const body = await firstValueFrom(this.http.get<{ items?: JobListItem[] } | JobListItem[]>('/api/jobs'));
    return Array.isArray(body) ? body : (body.items ?? []);
  }

  async get(id: string): Promise<JobView> {
    const job = await firstValueFrom(this.http.get<JobView>(`/api/jobs/${encodeURIComponent(id)}`));
    return { ...job, paymentSchedule: [...(job.paymentSchedule ?? [])].sort((a, b) => a.position - b.position) };
  }
}
