import { InjectionToken } from '@angular/core';

/**
 * Where the viewer gets an uploaded mesh's triangles: a function from `meshId` to either the STL
 * file's bytes (binary or ASCII) or the triangle corner positions (9 numbers a triangle), in the
 * file's own units. The app provides it (the designer fetches `…/meshes/:meshId/geometry`); without
 * it uploaded meshes are listed as not drawn. This file imports no three.js, so an app can provide
 * the token without pulling the viewer's chunk in.
 */
export type MeshGeometrySource = (meshId: string) => Promise<ArrayBuffer | Float32Array>;

/** The app's {@link MeshGeometrySource}; optional. */
export const MESH_GEOMETRY_SOURCE = new InjectionToken<MeshGeometrySource>('MESH_GEOMETRY_SOURCE');
