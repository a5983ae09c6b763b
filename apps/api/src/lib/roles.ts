import type { Role } from '@polecourt/contracts';

// Who may do what in the core workflow (api-contract.md, "Roles").
export const ANY_ROLE: Role[] = ['admin', 'systems_engineer', 'controls_engineer', 'auditor'];
export const REQUIREMENT_WRITERS: Role[] = ['admin', 'systems_engineer'];
export const CANDIDATE_WRITERS: Role[] = ['admin', 'controls_engineer'];
