import type { Project } from '@tumblewise/shared';
import { CATEGORY_LABELS } from './category-labels';

/** Matches a project against the filter text: name, category or notes, ignoring case. */
export function projectMatchesFilter(project: Project, filter: string): boolean {
  const needle = filter.trim().toLowerCase();
  if (!needle) return true;
  return [project.name, CATEGORY_LABELS[project.category] ?? project.category, project.notes].some((value) =>
    value.toLowerCase().includes(needle),
  );
}

/** The value a column sorts by: names without case, categories by their label, updates by date. */
export function projectSortValue(project: Project, column: string): string | number {
  switch (column) {
    case 'name':
      return project.name.toLocaleLowerCase();
    case 'category':
      return (CATEGORY_LABELS[project.category] ?? project.category).toLocaleLowerCase();
    case 'updated':
      return Date.parse(project.updatedAt) || 0;
    default:
      return '';
  }
}

/** The projects a list shows: archived ones only when asked for. */
export function visibleProjects(projects: readonly Project[], showArchived: boolean): Project[] {
  return projects.filter((p) => showArchived || !p.archived);
}
