import type { SeedStep } from "../step";
import { demoClub } from "./001-demo-club";
import { starterLibrary } from "./002-starter-library";
import { squadsAndPlans } from "./003-squads-and-plans";
import { reviewWeek } from "./004-review-week";

/** In order. Append new steps; never edit or reorder one that has shipped. */
export const SEED_STEPS: readonly SeedStep[] = [demoClub, starterLibrary, squadsAndPlans, reviewWeek];
