import "@fontsource/ibm-plex-sans/latin-400.css";
import "@fontsource/ibm-plex-sans/latin-500.css";
import "@fontsource/ibm-plex-sans/latin-600.css";
import "./styles/app.css";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router";
import { AppProvider, createQueryClient } from "./app/provider.tsx";
import { createAppRouter } from "./app/router.tsx";
import { createIdbPersister, startPersistence } from "./app/query-persistence.ts";
import { applyStoredTheme } from "./lib/theme.ts";

applyStoredTheme();

const queryClient = createQueryClient();
const persister = createIdbPersister();
const container = document.getElementById("root");
if (!container) throw new Error("index.html has no #root element.");

// The production build keeps its own files on the tablet, so it opens with no connection.
if (import.meta.env.PROD && "serviceWorker" in navigator) {
  void navigator.serviceWorker.register("/sw.js").catch((error: unknown) => console.warn("The app could not be kept for offline use.", error));
}

// The router's loaders read the cache at once, so the kept cache comes back first.
await startPersistence(queryClient, persister);
const router = createAppRouter(queryClient);

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient} persister={persister}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
