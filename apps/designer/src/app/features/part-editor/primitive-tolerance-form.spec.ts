import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import type { DraftPrimitive } from './draft-document';
import type { PrimitiveChange } from './primitive-form';
import { PrimitiveToleranceForm } from './primitive-tolerance-form';

const HOOP: DraftPrimitive = { id: 'hoop', shape: 'torus', majorRadius: 0.12, minorRadius: 0.008, density: 1500, tolerance: { density: 0.03 } };
const TIP: DraftPrimitive = { id: 'tip', shape: 'point', mass: 0.012 };

describe('PrimitiveToleranceForm', () => {
  async function render(primitive: DraftPrimitive, options: { readonly?: boolean; issues?: Record<string, string> } = {}) {
    TestBed.configureTestingModule({ providers: [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }] });
    const fixture = TestBed.createComponent(PrimitiveToleranceForm);
    fixture.componentRef.setInput('primitive', primitive);
    fixture.componentRef.setInput('index', 2);
    fixture.componentRef.setInput('readonly', options.readonly ?? false);
    fixture.componentRef.setInput('issues', options.issues ?? {});
    const changes: PrimitiveChange[] = [];
    fixture.componentInstance.changed.subscribe((c) => changes.push(c));
    await fixture.whenStable();
    fixture.detectChanges();
    const host: HTMLElement = fixture.nativeElement;
    const field = (name: string) => host.querySelector<HTMLInputElement>(`[data-testid="field-tolerance-${name}"]`);
    const type = async (name: string, value: string) => {
      const input = field(name)!;
      input.value = value;
      input.dispatchEvent(new Event('input'));
      await fixture.whenStable();
    };
    return { fixture, host, field, type, changes };
  }

  it('shows the primitive’s own tolerance and emits typed values in SI (1 mm = 0.001 m, 1 % = 0.01)', async () => {
    const { field, type, changes } = await render(HOOP);
    expect(field('density')!.value).toBe('3');
    expect(field('size')!.value).toBe('');
    await type('size', '0.2');
    expect(changes.at(-1)).toEqual({ field: 'tolerance.size', primitive: { ...HOOP, tolerance: { density: 0.03, size: 0.0002 } } });
    await type('density', '');
    expect(changes.at(-1)!.primitive['tolerance']).toEqual({ size: 0.0002 });
  });

  it('offers only a mass scatter for a point mass, with the default it stands for', async () => {
    const { host, field } = await render(TIP);
    expect(field('size')).toBeNull();
    expect(host.textContent).toContain('Mass ±');
    expect(host.textContent).toContain('Empty: ±5 % mass (common practice)');
  });

  it('shows the schema’s problem at its field', async () => {
    const { host } = await render(HOOP, { issues: { 'primitives[2].tolerance.density': 'must not be negative' } });
    expect(host.querySelector('[data-testid="error-tolerance-density"]')!.textContent).toContain('Density scatter must not be negative');
  });

  it('lets a reviewer read but not change the values', async () => {
    const { field } = await render(HOOP, { readonly: true });
    expect(field('density')!.disabled).toBe(true);
    expect(field('size')!.disabled).toBe(true);
  });
});
