import type { Project } from '@tumblewise/shared';
import { projectMatchesFilter, projectSortValue, visibleProjects } from './project-table';

// Invented projects.
const project = (name: string, category: Project['category'], updatedAt: string, archived = false, notes = ''): Project => ({
  id: `40000000-0000-4000-8000-${name.length.toString().padStart(12, '0')}`,
  name,
  category,
  notes,
  archived,
  createdAt: updatedAt,
  updatedAt,
});
const DISC = project('Flying disc 175 g', 'flying-disc', '2026-11-20T09:00:00.000Z', false, 'Rim-weighted');
const BATON = project('Juggling baton', 'juggling', '2026-11-25T09:00:00.000Z', true);
const RACKET = project('apex racket', 'racket', '2026-11-22T09:00:00.000Z');

describe('project table helpers', () => {
  it('filters by name, category label or notes, ignoring case', () => {
    expect(projectMatchesFilter(DISC, 'DISC')).toBe(true);
    expect(projectMatchesFilter(BATON, 'club or baton')).toBe(true); // the category label
    expect(projectMatchesFilter(DISC, 'rim')).toBe(true); // the notes
    expect(projectMatchesFilter(RACKET, 'javelin')).toBe(false);
    expect(projectMatchesFilter(RACKET, '  ')).toBe(true);
  });

  it('sorts names without case, categories by label and updates by date', () => {
    const byName = [DISC, BATON, RACKET].sort((a, b) =>
      String(projectSortValue(a, 'name')).localeCompare(String(projectSortValue(b, 'name'))),
    );
    expect(byName.map((p) => p.name)).toEqual(['apex racket', 'Flying disc 175 g', 'Juggling baton']);
    expect(projectSortValue(BATON, 'updated')).toBeGreaterThan(projectSortValue(RACKET, 'updated') as number);
    expect(projectSortValue(BATON, 'category')).toBe('juggling club or baton');
  });

  it('hides archived projects unless asked', () => {
    expect(visibleProjects([DISC, BATON, RACKET], false)).toEqual([DISC, RACKET]);
    expect(visibleProjects([DISC, BATON, RACKET], true)).toHaveLength(3);
  });
});
