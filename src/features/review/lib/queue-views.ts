// The queue's named views, kept free of imports: the router's redirect reads them on every start.

/** The shop lead's home: completed checks waiting for sign-off. */
export const waitingSearch = "?reviewState=waiting";
/** What waits for sign-off with an automatic flag: the checks to read first. */
export const flaggedWaitingSearch = "?reviewState=waiting&flagged=true";
/** Every session; `page` keeps the address from being the bare home. */
export const allSessionsSearch = "?page=1";
