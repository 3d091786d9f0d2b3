import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { partDocumentSchema } from '@tumblewise/shared';
import { documentIssues } from './document-issues';
import { toDraftDocument, withResolvedReferences, type DraftDocument, type DraftPrimitive } from './draft-document';
import { PrimitiveForm, type PrimitiveChange } from './primitive-form';
import { formValueToPrimitive, primitiveToFormValue, referencedControls } from './primitive-form-model';

// An invented Kestrel Bay hoop on a handle: the hoop's radius and the handle's length follow named parameters.
const HOOP: DraftPrimitive = {
  id: 'hoop',
  shape: 'torus',
  majorRadius: { param: 'hoopRadius' },
  minorRadius: 0.008,
  position: [0, 0, { param: 'hoopRadius', scale: 1, offset: 0.3 }],
  rotationDeg: [90, 0, 0],
  density: 1200,
  mode: 'add',
};
const stored = {
  name: 'Kestrel Bay hoop',
  parameters: { hoopRadius: 0.16 },
  primitives: [{ id: 'handle', shape: 'cylinder', radius: 0.012, length: 0.3, position: [0, 0, 0.15], density: 700 }, HOOP],
  spin: { axis: [0, 1, 0], rate: 20, misalignmentDeg: 1 },
};

describe('a draft with named parameters', () => {
  it('keeps the parameters and the references as loaded, and the shared schema accepts it', () => {
    const draft = toDraftDocument(JSON.parse(JSON.stringify(stored)));
    expect(draft['parameters']).toEqual({ hoopRadius: 0.16 });
    expect(draft.primitives[1]).toEqual(HOOP);
    expect(documentIssues(draft)).toEqual({});
  });

  it('writes a validated document’s refs back into the fields (the form the editor keeps)', () => {
    const validated = partDocumentSchema.parse(stored);
    expect(validated.primitives[1].refs).toBeDefined();
    const draft = toDraftDocument(JSON.parse(JSON.stringify(validated)));
    expect(draft.primitives[1]).not.toHaveProperty('refs');
    expect(draft.primitives[1]['majorRadius']).toEqual({ param: 'hoopRadius', scale: 1, offset: 0 });
    expect((draft.primitives[1]['position'] as unknown[])[2]).toEqual({ param: 'hoopRadius', scale: 1, offset: 0.3 });
    expect(partDocumentSchema.parse(draft)).toEqual(validated);
  });

  it('shows a referenced field empty with what it follows, keeps the reference while it stays empty, and takes a typed number', () => {
    const value = primitiveToFormValue(HOOP);
    expect(value['majorRadius']).toBeNull();
    expect(value['position_2']).toBeNull();
    expect(value['minorRadius']).toBe(8);
    expect(referencedControls(HOOP)).toEqual({ majorRadius: 'the parameter hoopRadius', position_2: 'hoopRadius + 0.3 (SI)' });
    // Editing another field leaves the references as they were.
    const edited = formValueToPrimitive({ ...value, minorRadius: 9 }, HOOP);
    expect(edited['majorRadius']).toEqual(HOOP['majorRadius']);
    expect(edited['position']).toEqual([0, 0, HOOP['position'] && (HOOP['position'] as unknown[])[2]]);
    expect(edited['minorRadius']).toBeCloseTo(0.009, 15);
    // A number typed into the field replaces its reference.
    const typed = formValueToPrimitive({ ...value, majorRadius: 150 }, HOOP);
    expect(typed['majorRadius']).toBeCloseTo(0.15, 15);
  });

  it('names an unknown parameter at the field, as the server does', () => {
    const draft = toDraftDocument({ ...stored, parameters: { radius: 0.16 } });
    expect(documentIssues(draft)).toEqual({
      'primitives[1].majorRadius': 'refers to an unknown parameter "hoopRadius"',
      'primitives[1].position[2]': 'refers to an unknown parameter "hoopRadius"',
    });
  });

  it('gives the viewer plain numbers', () => {
    const shown = withResolvedReferences(toDraftDocument(stored));
    const hoop = shown.primitives[1];
    expect(hoop['majorRadius']).toBe(0.16);
    expect((hoop['position'] as number[])[2]).toBeCloseTo(0.46, 15);
    // Without parameters the document is passed through untouched.
    const plain: DraftDocument = { primitives: [stored.primitives[0] as DraftPrimitive], spin: stored.spin };
    expect(withResolvedReferences(plain)).toBe(plain);
  });
});

describe('the primitive form of a primitive with references', () => {
  it('says which parameter a field follows, and keeps the reference when another field is edited', async () => {
    TestBed.configureTestingModule({ providers: [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }] });
    const fixture = TestBed.createComponent(PrimitiveForm);
    fixture.componentRef.setInput('primitive', HOOP);
    fixture.componentRef.setInput('index', 1);
    const changes: PrimitiveChange[] = [];
    fixture.componentInstance.changed.subscribe((c) => changes.push(c));
    await fixture.whenStable();
    fixture.detectChanges();
    const host: HTMLElement = fixture.nativeElement;
    expect(host.querySelector<HTMLInputElement>('[data-testid="field-majorRadius"]')!.value).toBe('');
    expect(host.querySelector('[data-testid="follows-majorRadius"]')!.textContent!.trim()).toBe('Follows the parameter hoopRadius');
    expect(host.querySelector('[data-testid="follows-position_2"]')!.textContent!.trim()).toBe('Follows hoopRadius + 0.3 (SI)');
    expect(host.querySelector('[data-testid="follows-minorRadius"]')).toBeNull();
    const minor = host.querySelector<HTMLInputElement>('[data-testid="field-minorRadius"]')!;
    minor.value = '9';
    minor.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(changes.at(-1)!.primitive['majorRadius']).toEqual({ param: 'hoopRadius' });
    expect(changes.at(-1)!.primitive['minorRadius']).toBeCloseTo(0.009, 15);
  });
});
