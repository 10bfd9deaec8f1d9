/** Where "my vises and machines" lives in the client. */
export const workshopPath = "/workshop";
