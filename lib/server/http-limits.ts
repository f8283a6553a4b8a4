/** The largest request body any route reads; proxy.ts refuses a larger Content-Length before routing. */
export const MAX_BODY_BYTES = 1024 * 1024;
