import "server-only";
import { notFound } from "next/navigation";
import { NotFound } from "@/lib/errors";

/** In pages, a domain NotFound becomes Next's 404 page. */
export async function orNotFound<T>(work: Promise<T>): Promise<T> {
  try {
    return await work;
  } catch (error) {
    if (error instanceof NotFound) notFound();
    throw error;
  }
}
