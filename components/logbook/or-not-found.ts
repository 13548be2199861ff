import { notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

/** For pages: another driver's (or a missing) item renders the 404 page, like the API's 404. */
export function orNotFound(e: unknown): never {
  if (e instanceof AppError && e.code === "not_found") notFound();
  throw e;
}
