import type { BoardRole } from '@barwright/contracts';

/** Board roles as the page names them. */
export const ROLE_LABELS: Readonly<Record<BoardRole, string>> = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer' };

/** What each role may do, said once beside the role select. */
export const ROLE_HINTS: Readonly<Record<BoardRole, string>> = {
  owner: 'manages members, invitations and the bin',
  editor: 'edits designs and saves versions',
  viewer: 'follows changes live, cannot edit',
};
