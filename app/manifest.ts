import type { MetadataRoute } from "next";

/** Installable as an app on a phone; opens on the athlete's Today screen. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Rungwise",
    short_name: "Rungwise",
    description: "Your rungs, your standards and today's sets — works offline after the first visit.",
    start_url: "/today",
    scope: "/",
    display: "standalone",
    orientation: "portrait",
    background_color: "#f6f3ec",
    theme_color: "#2f5d50",
    icons: [{ src: "/icon.svg", sizes: "any", type: "image/svg+xml", purpose: "any" }],
  };
}
