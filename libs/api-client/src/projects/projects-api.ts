import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { CreateProjectBody, Project } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** The workspace's projects. */
@Injectable({ providedIn: 'root' })
export class ProjectsApi {
  private readonly http = inject(HttpClient);
  private readonly base = inject(API_BASE_URL);

  /** Lists the workspace's projects. */
  list(workspaceId: string): Observable<Project[]> {
    return this.http.get<Project[]>(this.url(workspaceId));
  }

  /** Creates a project. */
  create(workspaceId: string, body: CreateProjectBody): Observable<Project> {
    return this.http.post<Project>(this.url(workspaceId), body);
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/projects`;
  }
}
