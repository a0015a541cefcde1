import { redirect } from "next/navigation";

// The coach's home; the weekly readiness review takes this spot once it exists.
export default function CoachHome() {
  redirect("/coach/athletes");
}
