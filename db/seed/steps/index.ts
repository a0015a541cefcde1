import type { SeedStep } from "../step";
import { demoClub } from "./001-demo-club";
import { starterLibrary } from "./002-starter-library";
import { squadsAndPlans } from "./003-squads-and-plans";
import { trainingHistory } from "./004-training-history";
import { readinessScenario } from "./005-readiness-scenario";
import { notificationPreferencesStep } from "./006-notification-preferences";

/** In order. Append new steps; never edit or reorder one that has shipped. */
export const SEED_STEPS: readonly SeedStep[] = [
  demoClub,
  starterLibrary,
  squadsAndPlans,
  trainingHistory,
  readinessScenario,
  notificationPreferencesStep,
];
