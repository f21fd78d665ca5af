import { describe, expect, it } from "vitest";
import { EnvError, loadEnv } from "../../server/env.ts";

describe("loadEnv", () => {
  it("applies the documented defaults", () => {
    const env = loadEnv({});
    expect(env).toMatchObject({ PORT: 3000, HOST: "0.0.0.0", DATA_DIR: "./data", COOKIE_SECURE: "auto", SEED_DEMO: true, BACKUPS_KEPT: 5 });
    expect(env.DATABASE_URL).toBeUndefined();
  });

  it("names every bad variable and why", () => {
    let error: unknown;
    try {
      loadEnv({ PORT: "eighty", DATABASE_URL: "mysql://x", TRUST_PROXY: "true", SEED_DEMO: "maybe" });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(EnvError);
    const message = (error as EnvError).message;
    for (const name of ["PORT", "DATABASE_URL", "TRUST_PROXY", "SEED_DEMO"]) expect(message).toContain(`${name}=`);
    expect(message).toContain("never true");
  });

  it("accepts a PostgreSQL URL, a hop count and extra origins", () => {
    const env = loadEnv({ DATABASE_URL: "postgres://bench@127.0.0.1:5432/bench", TRUST_PROXY: "1", ALLOWED_ORIGINS: "https://bench.example, https://tablet.example" });
    expect(env.ALLOWED_ORIGINS).toEqual(["https://bench.example", "https://tablet.example"]);
  });
});
