/** Request header proxy.ts sets to the requested path, so /sign-in can send the user back there. */
export const PATH_HEADER = "x-foulcast-path";
