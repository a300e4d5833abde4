/** The query cache key of the coach's invitation list, shared by the form that adds to it. */
export const INVITATIONS_KEY = ["invitations"] as const;
