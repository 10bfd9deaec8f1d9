/** Client routes of saved designs. The server builds share URLs as `<origin>/shared/<token>` to match. */
export const designsPath = "/designs";
export const sharedDesignRoute = "/shared/:token";
export const sharedDesignPath = (token: string) => `/shared/${encodeURIComponent(token)}`;
