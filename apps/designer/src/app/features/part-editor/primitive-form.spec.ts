import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import type { DraftPrimitive } from './draft-document';
import { PrimitiveForm, type PrimitiveChange } from './primitive-form';

// Invented primitives (form wiring under test; the unit conversions are SI prefixes).
const HOOP: DraftPrimitive = {
  id: 'hoop',
  shape: 'torus',
  majorRadius: 0.12,
  minorRadius: 0.008,
  density: 1500,
  tolerance: { density: 0.03 },
};
const TIP: DraftPrimitive = { id: 'tip', shape: 'point', mass: 0.012 };

describe('PrimitiveForm', () => {
  async function render(primitive: DraftPrimitive, options: { readonly?: boolean; issues?: Record<string, string> } = {}) {
    TestBed.configureTestingModule({ providers: [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }] });
    const fixture = TestBed.createComponent(PrimitiveForm);
    fixture.componentRef.setInput('primitive', primitive);
    fixture.componentRef.setInput('index', 2);
    fixture.componentRef.setInput('readonly', options.readonly ?? false);
    fixture.componentRef.setInput('issues', options.issues ?? {});
    const changes: PrimitiveChange[] = [];
    fixture.componentInstance.changed.subscribe((c) => changes.push(c));
    await fixture.whenStable();
    fixture.detectChanges();
    const host: HTMLElement = fixture.nativeElement;
    const field = (name: string) => host.querySelector<HTMLInputElement>(`[data-testid="field-${name}"]`);
    const type = async (name: string, value: string) => {
      const input = field(name)!;
      input.value = value;
      input.dispatchEvent(new Event('input'));
      await fixture.whenStable();
    };
    return { fixture, host, field, type, changes };
  }

  describe('manufacturing tolerance', () => {
    it('shows the primitive’s own tolerance and emits typed values in SI (1 mm = 0.001 m, 1 % = 0.01)', async () => {
      const { field, type, changes } = await render(HOOP);
      expect(field('tolerance-density')!.value).toBe('3');
      expect(field('tolerance-size')!.value).toBe('');
      await type('tolerance-size', '0.2');
      expect(changes.at(-1)).toEqual({ field: 'tolerance.size', primitive: { ...HOOP, tolerance: { density: 0.03, size: 0.0002 } } });
      await type('tolerance-density', '');
      expect(changes.at(-1)!.primitive['tolerance']).toEqual({ size: 0.0002 });
    });

    it('offers only a mass scatter for a point mass, with the default it stands for', async () => {
      const { host, field } = await render(TIP);
      expect(field('tolerance-size')).toBeNull();
      expect(host.querySelector('[data-testid="tolerance-form"]')!.textContent).toContain('Mass ±');
      expect(host.textContent).toContain('Empty: ±5 % mass (common practice)');
    });

    it('shows the schema’s problem at its field, and keeps it while the designer types', async () => {
      const { host, fixture, type } = await render(HOOP, { issues: { 'primitives[2].tolerance.density': 'must not be negative' } });
      const error = () => host.querySelector('[data-testid="error-tolerance-density"]');
      expect(error()!.textContent).toContain('Density scatter must not be negative');
      await type('tolerance-density', '-2');
      fixture.detectChanges();
      expect(error()!.textContent).toContain('Density scatter must not be negative');
      fixture.componentRef.setInput('issues', {});
      await fixture.whenStable();
      fixture.detectChanges();
      expect(error()).toBeNull();
    });

    it('lets a reviewer read but not change the values', async () => {
      const { field } = await render(HOOP, { readonly: true });
      expect(field('tolerance-density')!.disabled).toBe(true);
      expect(field('tolerance-size')!.disabled).toBe(true);
    });

    it('keeps the tolerance when another field changes, and the other fields when the tolerance changes', async () => {
      const { type, changes } = await render(HOOP);
      await type('minorRadius', '9');
      expect(changes.at(-1)!.field).toBe('minorRadius');
      expect(changes.at(-1)!.primitive['minorRadius']).toBeCloseTo(0.009, 12);
      expect(changes.at(-1)!.primitive['tolerance']).toEqual({ density: 0.03 });
      await type('tolerance-density', '4');
      expect(changes.at(-1)).toEqual({ field: 'tolerance.density', primitive: { ...HOOP, tolerance: { density: 0.04 } } });
    });
  });
});
