/** The class-list table group as the subline reads it. */
export const tableGroupLabel = (tableGroup: string | null): string => (tableGroup ? `Table ${tableGroup}` : 'No table group');
