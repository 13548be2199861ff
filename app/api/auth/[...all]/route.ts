// better-auth's HTTP endpoints, behind the allow-list and guards of lib/auth/endpoints.ts.
import { toNextJsHandler } from "better-auth/next-js";
import { guardAuthHandler } from "@/lib/auth/endpoints";
import { auth } from "@/lib/auth/server";

const handlers = toNextJsHandler(auth);

export const GET = guardAuthHandler(handlers.GET);
export const POST = guardAuthHandler(handlers.POST);
