export const schoolQueryKey = ['admin', 'school'] as const;
