import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { Breadcrumbs, partTrail } from './breadcrumbs';

describe('Breadcrumbs', () => {
  function render(trail: ReturnType<typeof partTrail>): HTMLElement {
    TestBed.configureTestingModule({ imports: [Breadcrumbs], providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(Breadcrumbs);
    fixture.componentRef.setInput('trail', trail);
    fixture.detectChanges();
    return fixture.nativeElement;
  }

  it('links every step but the last, which is the current page', () => {
    const host = render(partTrail('p-1', 'Kestrel Bay discs', 'part-9', 'Glide 170', 'Scatter study'));
    const nav = host.querySelector('nav')!;
    expect(nav.getAttribute('aria-label')).toBe('Breadcrumb');
    const links = [...nav.querySelectorAll('a')].map((a) => [a.textContent!.trim(), a.getAttribute('href')]);
    expect(links).toEqual([
      ['Projects', '/'],
      ['Kestrel Bay discs', '/projects/p-1'],
      ['Glide 170', '/projects/p-1/parts/part-9'],
    ]);
    const current = nav.querySelector('[aria-current="page"]')!;
    expect(current.tagName).toBe('SPAN');
    expect(current.textContent!.trim()).toBe('Scatter study');
    expect(host.querySelector('[data-testid="crumb-part"]')!.textContent!.trim()).toBe('Glide 170');
  });

  it('names the project and part in general words until they have loaded', () => {
    const host = render(partTrail('p-1', undefined, 'part-9', undefined, 'Compare variants'));
    expect([...host.querySelectorAll('a')].map((a) => a.textContent!.trim())).toEqual(['Projects', 'Project', 'Part']);
  });

  it('puts one separator between steps, linked or not', () => {
    const host = render([{ label: 'Projects', link: '/' }, { label: 'Archived' }, { label: 'Old part' }]);
    expect([...host.querySelector('nav')!.children].map((e) => e.textContent!.trim())).toEqual([
      'Projects',
      '›',
      'Archived',
      '›',
      'Old part',
    ]);
  });
});
