/** Roles inside a brewery. Internal keys are ours; labels are what people read. */
export const ROLES = ['head_brewer', 'assistant_brewer', 'taproom_manager'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  head_brewer: 'Head brewer',
  assistant_brewer: 'Assistant brewer',
  taproom_manager: 'Taproom manager',
};
