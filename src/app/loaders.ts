import { data, redirect, type LoaderFunctionArgs } from "react-router";
import type { QueryClient } from "@tanstack/react-query";
import { meQueryOptions } from "../features/auth/api/get-me.ts";
import { safeNextPath, signInPathFor } from "../lib/next-path.ts";
import { canOpenArea, homeAreaFor, type AreaId } from "./areas.ts";

/** Thrown when a signed-in person opens an area their role does not include. */
export interface NotForRoleData {
  area: AreaId;
}

export function rootLoader(queryClient: QueryClient) {
  return () => queryClient.ensureQueryData(meQueryOptions());
}

export function signInLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (me) throw redirect(safeNextPath(new URL(request.url).searchParams.get("next")) ?? "/");
    return null;
  };
}

export function signedInLoader(queryClient: QueryClient) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) throw redirect(signInPathFor(new URL(request.url)));
    return null;
  };
}

export function homeLoader(queryClient: QueryClient) {
  return async () => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) throw redirect("/sign-in");
    throw redirect(homeAreaFor(me.user.role).path);
  };
}

export function areaLoader(queryClient: QueryClient, area: AreaId) {
  return async ({ request }: LoaderFunctionArgs) => {
    const me = await queryClient.ensureQueryData(meQueryOptions());
    if (!me) throw redirect(signInPathFor(new URL(request.url)));
    if (!canOpenArea(me.user.role, area)) throw data<NotForRoleData>({ area }, { status: 403 });
    return null;
  };
}
