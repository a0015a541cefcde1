import { redirect } from "next/navigation";

// The coach's home is the weekly readiness review.
export default function CoachHome() {
  redirect("/coach/readiness");
}
