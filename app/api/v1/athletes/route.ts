import { createAthlete } from "@/lib/server/athletes/create-athlete";
import { listAthletes } from "@/lib/server/athletes/list-athletes";
import { route } from "@/lib/server/http/route";
import { ZAthleteListQuery, ZCreateAthlete } from "@/lib/validation/athletes";

export const GET = route({ can: "athletes.read", query: ZAthleteListQuery }, ({ actor, query }) =>
  listAthletes(actor, query),
);

export const POST = route({ can: "athletes.write", body: ZCreateAthlete, status: 201 }, ({ actor, body }) =>
  createAthlete(actor, body),
);
