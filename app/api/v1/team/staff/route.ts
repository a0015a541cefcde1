import { route } from "@/lib/server/http/route";
import { listStaff } from "@/lib/server/teams/list-staff";

export const GET = route({ can: "athletes.read" }, async ({ actor }) => ({ items: await listStaff(actor), nextCursor: null }));
