import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { Observable } from 'rxjs';
import type { OrganisationApiToken } from '@shared/analysis/api-token';
import type { Role } from '@shared/auth/roles';
import type { Invitation, InvitationRequest } from '@shared/members/invitation';
import type { Member, MemberRolesUpdate } from '@shared/members/member';
import { withoutErrorNotice } from '../../core/error-notice-context';

/**
 * The admin's member and invitation endpoints. Every caller shows failures in place (beside a
 * field, in the dialog or the page), so the global snack bar stays quiet for these requests.
 */
@Injectable({ providedIn: 'root' })
export class MembersApi {
  private readonly http = inject(HttpClient);
  private readonly quiet = { context: withoutErrorNotice() };

  listMembers(): Observable<Member[]> {
    return this.http.get<Member[]>('/api/members', this.quiet);
  }

  updateRoles(userId: string, roles: readonly Role[]): Observable<unknown> {
    const body: MemberRolesUpdate = { roles: [...roles] };
    return this.http.put(`/api/members/${encodeURIComponent(userId)}/roles`, body, this.quiet);
  }

  /** Signs the member out everywhere and revokes their study roles and tokens; history stays. */
  deactivate(userId: string): Observable<unknown> {
    return this.http.post(`/api/members/${encodeURIComponent(userId)}/deactivate`, {}, this.quiet);
  }

  reactivate(userId: string): Observable<unknown> {
    return this.http.post(`/api/members/${encodeURIComponent(userId)}/reactivate`, {}, this.quiet);
  }

  /** Every read-API token of the organisation, with its owner. */
  listTokens(): Observable<OrganisationApiToken[]> {
    return this.http.get<OrganisationApiToken[]>('/api/admin/tokens', this.quiet);
  }

  revokeToken(tokenId: string): Observable<OrganisationApiToken> {
    return this.http.delete<OrganisationApiToken>(
      `/api/admin/tokens/${encodeURIComponent(tokenId)}`,
      this.quiet,
    );
  }

  listInvitations(): Observable<Invitation[]> {
    return this.http.get<Invitation[]>('/api/invitations', this.quiet);
  }

  invite(request: InvitationRequest): Observable<Invitation> {
    return this.http.post<Invitation>('/api/invitations', request, this.quiet);
  }

  /** Withdraws an invitation not yet accepted; its link stops working. */
  withdrawInvitation(invitationId: string): Observable<unknown> {
    return this.http.delete(`/api/invitations/${encodeURIComponent(invitationId)}`, this.quiet);
  }
}
