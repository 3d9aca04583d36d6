import { toNextJsHandler } from "better-auth/next-js";
import { getAuth } from "@/lib/auth/auth";

export const dynamic = "force-dynamic";

/** better-auth's endpoints under /api/auth: sign-in/email, sign-out, get-session, … (public by nature). */
export const { GET, POST, PATCH, PUT, DELETE } = toNextJsHandler((request: Request) => getAuth().handler(request));
