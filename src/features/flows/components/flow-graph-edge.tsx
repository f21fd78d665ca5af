// A way from one step to the next, drawn along the bends the layout chose, with its label where the layout left room.
import { BaseEdge, EdgeLabelRenderer, type Edge, type EdgeProps } from "@xyflow/react";
import type { Point } from "../lib/flow-layout.ts";

export type MapFlowEdge = Edge<{ label: string | null; broken: boolean; points: Point[]; labelAt: Point | null }, "way">;

const f = (n: number) => Math.round(n * 10) / 10;

/** A smooth curve through every point (Catmull-Rom turned into cubic Béziers). */
export function curveThrough(points: readonly Point[]): string {
  if (points.length === 0) return "";
  let d = `M ${f(points[0]!.x)} ${f(points[0]!.y)}`;
  for (let i = 0; i < points.length - 1; i++) {
    const p0 = points[i - 1] ?? points[i]!;
    const p1 = points[i]!;
    const p2 = points[i + 1]!;
    const p3 = points[i + 2] ?? p2;
    const c1 = { x: p1.x + (p2.x - p0.x) / 6, y: p1.y + (p2.y - p0.y) / 6 };
    const c2 = { x: p2.x - (p3.x - p1.x) / 6, y: p2.y - (p3.y - p1.y) / 6 };
    d += ` C ${f(c1.x)} ${f(c1.y)}, ${f(c2.x)} ${f(c2.y)}, ${f(p2.x)} ${f(p2.y)}`;
  }
  return d;
}

/** A closed arrowhead whose tip sits on the last point, pointing the way the curve arrives. */
export function arrowHead(points: readonly Point[], length = 12, halfWidth = 6): string {
  const tip = points[points.length - 1];
  const from = points[points.length - 2];
  if (!tip || !from) return "";
  const dx = tip.x - from.x;
  const dy = tip.y - from.y;
  const len = Math.hypot(dx, dy) || 1;
  const ux = dx / len;
  const uy = dy / len;
  const bx = tip.x - ux * length;
  const by = tip.y - uy * length;
  return `M ${f(tip.x)} ${f(tip.y)} L ${f(bx - uy * halfWidth)} ${f(by + ux * halfWidth)} L ${f(bx + uy * halfWidth)} ${f(by - ux * halfWidth)} Z`;
}

export function WayEdge({ id, sourceX, sourceY, targetX, targetY, data }: EdgeProps<MapFlowEdge>) {
  const laid = data?.points ?? [];
  // The layout's points match the boxes, whose sizes it chose; the handles are only a fallback.
  const points = laid.length >= 2 ? laid : [{ x: sourceX, y: sourceY }, { x: targetX, y: targetY }];
  const broken = data?.broken ?? false;
  const label = data?.label ?? null;
  const at = data?.labelAt ?? { x: (sourceX + targetX) / 2, y: (sourceY + targetY) / 2 };
  return (
    <>
      <BaseEdge id={id} path={curveThrough(points)} className={broken ? "[stroke-dasharray:8_6]" : undefined} />
      <path d={arrowHead(points)} className={broken ? "fill-problem" : "fill-line-strong"} aria-hidden="true" />
      {label !== null && (
        <EdgeLabelRenderer>
          <div
            style={{ transform: `translate(-50%, -50%) translate(${at.x}px, ${at.y}px)` }}
            className={`absolute max-w-[220px] truncate rounded-md border-2 bg-raised px-2 text-sm font-semibold text-ink ${broken ? "border-dashed border-problem" : "border-line"}`}
          >
            {label}
          </div>
        </EdgeLabelRenderer>
      )}
    </>
  );
}

export const edgeTypes = { way: WayEdge };
