/** Query keys of the members feature, scoped by lab; `membersKeys.lab(labId)` reaches a lab's whole family. */
export const membersKeys = {
  all: ['members'] as const,
  lab: (labId: number) => [...membersKeys.all, labId] as const,
  list: (labId: number) => [...membersKeys.lab(labId), 'list'] as const,
  invitations: (labId: number) => [...membersKeys.lab(labId), 'invitations'] as const,
  deliveryLog: (labId: number) => [...membersKeys.lab(labId), 'delivery-log'] as const,
};
