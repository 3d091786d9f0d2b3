import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { CreateProjectBody, GearCategory, Project } from '@tumblewise/shared';
import { Observable } from 'rxjs';
import { API_BASE_URL } from '../api-base-url';

/** What a project update may change. */
export interface UpdateProject {
  name?: string;
  category?: GearCategory;
  notes?: string;
  archived?: boolean;
}

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

  /** Loads one project. */
  get(workspaceId: string, projectId: string): Observable<Project> {
    return this.http.get<Project>(`${this.url(workspaceId)}/${encodeURIComponent(projectId)}`);
  }

  /** Renames, recategorises, annotates, archives or restores a project. */
  update(workspaceId: string, projectId: string, changes: UpdateProject): Observable<Project> {
    return this.http.patch<Project>(`${this.url(workspaceId)}/${encodeURIComponent(projectId)}`, changes);
  }

  private url(workspaceId: string): string {
    return `${this.base}/workspaces/${encodeURIComponent(workspaceId)}/projects`;
  }
}
