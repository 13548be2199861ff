import type { MetadataRoute } from "next";
import { asphalt, groove } from "@/lib/visual/tokens";

// The web app manifest (served at /manifest.webmanifest): Fourpatch added to a
// phone's home screen opens on the driver's vehicles, with the mark as its icon.
export default function manifest(): MetadataRoute.Manifest {
  return {
    name: "Fourpatch — tire logbook",
    short_name: "Fourpatch",
    description: "Your tires' date codes, tread checks and the dates they reach their limits.",
    start_url: "/vehicles",
    scope: "/",
    display: "standalone",
    background_color: asphalt[50],
    theme_color: groove[700],
    icons: [
      { src: "/icons/icon-192.png", sizes: "192x192", type: "image/png", purpose: "any" },
      { src: "/icons/icon-512.png", sizes: "512x512", type: "image/png", purpose: "any" },
      { src: "/icons/icon-maskable-512.png", sizes: "512x512", type: "image/png", purpose: "maskable" },
    ],
  };
}
