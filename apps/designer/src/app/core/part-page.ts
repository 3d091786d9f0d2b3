import { computed, inject, type Signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { PartsApi, ProjectsApi, toApiError, VariantsApi, WorkspaceContext } from '@tumblewise/api-client';
import type { Variant } from '@tumblewise/shared';

/** The route inputs a page of one part reads. */
export interface PartPageInputs {
  /** Route parameter `:partId`. */
  partId: Signal<string>;
  /** Route parameter `:projectId`; given only by pages that show the project (in their breadcrumbs). */
  projectId?: Signal<string>;
  /** Query parameter `?variant=`; given only by pages that show one variant. */
  variant?: Signal<string | undefined>;
}

/** The label a variant goes by ("v3 longer throat"). */
export function variantLabel(v: Pick<Variant, 'number' | 'label'>): string {
  return `v${v.number}${v.label ? ` ${v.label}` : ''}`;
}

/** The variant in the address, else the newest; null when the address names none of `list`. */
export function chooseVariant(list: readonly Variant[], asked: string | undefined): Variant | null {
  return asked ? (list.find((v) => v.id === asked) ?? null) : (list[list.length - 1] ?? null);
}

/**
 * What a page about one part loads: the part, its variants (oldest first) and, when asked, its
 * project; the variant the page shows; one error message for the loads; and a reload. Call it in
 * an injection context (a field initialiser of the page). Everything waits for the current
 * workspace and follows the input signals.
 */
export function partPage(inputs: PartPageInputs) {
  const workspace = inject(WorkspaceContext);
  const projectsApi = inject(ProjectsApi);
  const partsApi = inject(PartsApi);
  const variantsApi = inject(VariantsApi);

  const scope = computed(() => {
    const workspaceId = workspace.workspaceId();
    return workspaceId ? { workspaceId, partId: inputs.partId() } : undefined;
  });
  const projectScope = computed(() => {
    const workspaceId = workspace.workspaceId();
    return workspaceId && inputs.projectId ? { workspaceId, projectId: inputs.projectId() } : undefined;
  });

  const project = rxResource({
    params: () => projectScope(),
    stream: ({ params }) => projectsApi.get(params.workspaceId, params.projectId),
  });
  const part = rxResource({ params: () => scope(), stream: ({ params }) => partsApi.get(params.workspaceId, params.partId) });
  const variants = rxResource({ params: () => scope(), stream: ({ params }) => variantsApi.list(params.workspaceId, params.partId) });

  /** The part's variants, oldest first; empty until they arrive. */
  const list = computed<Variant[]>(() => (variants.hasValue() ? variants.value() : []));
  /** The variant of `?variant=`, else the newest; null before the list arrives or when the address names none of this part's. */
  const chosen = computed<Variant | null>(() => chooseVariant(list(), inputs.variant?.()));
  /** Why the part or its variants could not be loaded (the project only names a breadcrumb, so its failure is not one). */
  const loadError = computed(() => {
    const error = variants.error() ?? part.error();
    return error ? toApiError(error).message : null;
  });

  return {
    project,
    part,
    variants,
    list,
    chosen,
    loadError,
    /** Loads the project (when asked for), the part and its variants again. */
    reload(): void {
      if (inputs.projectId) project.reload();
      part.reload();
      variants.reload();
    },
  };
}

/** What `partPage` returns. */
export type PartPage = ReturnType<typeof partPage>;
