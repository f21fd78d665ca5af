import "@fontsource/ibm-plex-sans/latin-400.css";
import "@fontsource/ibm-plex-sans/latin-500.css";
import "@fontsource/ibm-plex-sans/latin-600.css";
import "./styles/app.css";
import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import { RouterProvider } from "react-router";
import { AppProvider, createQueryClient } from "./app/provider.tsx";
import { createAppRouter } from "./app/router.tsx";
import { createIdbPersister } from "./app/query-persistence.ts";
import { applyStoredTheme } from "./lib/theme.ts";

applyStoredTheme();

const queryClient = createQueryClient();
const router = createAppRouter(queryClient);
const persister = createIdbPersister();
const container = document.getElementById("root");
if (!container) throw new Error("index.html has no #root element.");

createRoot(container).render(
  <StrictMode>
    <AppProvider queryClient={queryClient} persister={persister}>
      <RouterProvider router={router} />
    </AppProvider>
  </StrictMode>,
);
