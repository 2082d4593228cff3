/** The design-document version written today (the schemas of every version live beside this file). */
export const CURRENT_VERSION = 2;
