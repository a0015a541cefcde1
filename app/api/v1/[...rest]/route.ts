import { NotFound } from "@/lib/errors";
import { errorResponse } from "@/lib/server/http/error-response";

// Unknown API paths answer JSON, never the HTML not-found page.
function notFound() {
  return errorResponse(new NotFound("API route"));
}

export { notFound as GET, notFound as POST, notFound as PUT, notFound as PATCH, notFound as DELETE };
