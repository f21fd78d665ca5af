import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";
import tailwindcss from "@tailwindcss/vite";

/** Emits sw.js with this build's files listed, so the tablet keeps exactly the app it was given. */
function offlineShell(): Plugin {
  return {
    name: "benchpath-offline-shell",
    apply: "build",
    generateBundle(_options, bundle) {
      const files = ["/", ...Object.keys(bundle).filter((name) => name !== "index.html" && !name.endsWith(".map")).map((name) => `/${name}`)].sort();
      const version = createHash("sha256").update(files.join("\n")).digest("hex").slice(0, 12);
      const template = readFileSync(new URL("./src/app/offline/service-worker.js", import.meta.url), "utf8");
      const source = template.replace("self.__SHELL_FILES__", JSON.stringify(files)).replace("__SHELL_VERSION__", version);
      this.emitFile({ type: "asset", fileName: "sw.js", source });
    },
  };
}

export default defineConfig({
  plugins: [react(), tailwindcss(), offlineShell()],
  build: {
    outDir: "dist/client",
    emptyOutDir: true,
    sourcemap: false,
  },
  server: {
    proxy: { "/api": "http://127.0.0.1:3000" },
  },
});
