import { SetMetadata } from '@nestjs/common';

/** What a route parameter names; the project it belongs to is looked up from it. */
export type ScopeKind = 'project' | 'submittal' | 'discrepancy' | 'calc-file';

export interface ProjectScopeOptions {
  readonly kind: ScopeKind;
  /** Route parameter holding the id. */
  readonly param: string;
}

export const PROJECT_SCOPE = 'ligament:project-scope';
/**
 * The caller must be a member of the project the parameter leads to (admins pass: they manage
 * projects). The guard answers 404 when the id does not exist, 403 when the caller is not a member.
 */
export const ProjectScope = (kind: ScopeKind, param: string) =>
  SetMetadata(PROJECT_SCOPE, { kind, param } satisfies ProjectScopeOptions);
