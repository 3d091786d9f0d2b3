import { BoxGeometry, Group, Mesh, MeshBasicMaterial } from 'three';
import { disposeObject } from './dispose-object';
import { sharedMaterial } from './shared-materials';

describe('shared materials', () => {
  it('gives one material per key, and disposing a drawing leaves it while freeing the rest', () => {
    const make = jest.fn(() => new MeshBasicMaterial({ color: '#336699' }));
    const shared = sharedMaterial('spec:blue', make);
    expect(sharedMaterial('spec:blue', make)).toBe(shared);
    expect(make).toHaveBeenCalledTimes(1);

    const own = new MeshBasicMaterial();
    const geometry = new BoxGeometry(1, 1, 1);
    const root = new Group();
    root.add(new Mesh(geometry, shared), new Mesh(new BoxGeometry(1, 1, 1), own));
    const disposed: string[] = [];
    shared.addEventListener('dispose', () => disposed.push('shared'));
    own.addEventListener('dispose', () => disposed.push('own'));
    geometry.addEventListener('dispose', () => disposed.push('geometry'));
    disposeObject(root);
    expect(disposed.sort()).toEqual(['geometry', 'own']);
  });
});
