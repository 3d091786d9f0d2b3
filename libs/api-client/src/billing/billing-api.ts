import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Billing, Invoice } from '@tumblewise/shared';
import { Observable, tap } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';
import { WorkspaceStandings } from './workspace-standing';

/** What starting a subscription sends: seats and a card token from the card form (never a card number). */
export interface StartSubscription {
  planId?: string;
  seats: number;
  cardToken: string;
}

/** The workspace's plan, seats, subscription, payment method and invoices (`/workspaces/:id/billing`). */
@Injectable({ providedIn: 'root' })
export class BillingApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);
  private readonly standings = inject(WorkspaceStandings);

  /** Plan catalogue, seats, subscription, payment method and workspace state (owners and admins). */
  get(workspaceId: string): Observable<Billing> {
    return this.http.get<Billing>(this.url(workspaceId)).pipe(this.noting(workspaceId));
  }

  /** Buys seats on a plan with a card token; 402 `card_declined` changes nothing (owners). */
  start(workspaceId: string, body: StartSubscription): Observable<Billing> {
    return this.http.post<Billing>(`${this.url(workspaceId)}/subscription`, body).pipe(this.noting(workspaceId));
  }

  /** Changes the number of seats (prorated on the next invoice); 409 `seats_in_use` below members + pending invitations. */
  changeSeats(workspaceId: string, seats: number): Observable<Billing> {
    return this.http.patch<Billing>(`${this.url(workspaceId)}/subscription`, { seats }).pipe(this.noting(workspaceId));
  }

  /** Ends the subscription at the end of the current period. */
  cancel(workspaceId: string): Observable<Billing> {
    return this.http.post<Billing>(`${this.url(workspaceId)}/subscription/cancel`, null).pipe(this.noting(workspaceId));
  }

  /** Takes back a cancellation made for the end of the period. */
  resume(workspaceId: string): Observable<Billing> {
    return this.http.post<Billing>(`${this.url(workspaceId)}/subscription/resume`, null).pipe(this.noting(workspaceId));
  }

  /** Replaces the card with a new card token; 402 on decline, the old card stays. */
  updatePaymentMethod(workspaceId: string, cardToken: string): Observable<Billing> {
    return this.http.put<Billing>(`${this.url(workspaceId)}/payment-method`, { cardToken }).pipe(this.noting(workspaceId));
  }

  /** The workspace's invoices, newest first. */
  invoices(workspaceId: string): Observable<Invoice[]> {
    return this.http.get<Invoice[]>(`${this.url(workspaceId)}/invoices`);
  }

  private noting(workspaceId: string) {
    return tap<Billing>((billing) => this.standings.noteBilling(workspaceId, billing));
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/billing`;
  }
}
