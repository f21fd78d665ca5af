// The whole flow as a map the senior tech can pan and pinch: one box per step, one arrow per way out.
import "@xyflow/react/dist/style.css";
import { useEffect, useMemo } from "react";
import { Panel, Position, ReactFlow, useReactFlow, useStore, type Node } from "@xyflow/react";
import { Button } from "../../../components/ui/button.tsx";
import { layoutShape, nodeSize, placeShape, readFlowMap, stepNodeId, type LayoutShape, type MapNode, type Placement } from "../lib/flow-layout.ts";
import type { FlowGraphProps } from "../lib/view-slots.ts";
import { edgeTypes, type MapFlowEdge } from "./flow-graph-edge.tsx";
import { nodeTypes, SelectStepContext } from "./flow-graph-node.tsx";

function toFlowNode(node: MapNode, placement: Placement, selectedStepId: string | null): Node {
  const { width, height } = nodeSize[node.type];
  const position = placement.nodes[node.id] ?? { x: 0, y: 0 };
  // Handles given up front let the arrows draw before the boxes are measured.
  const handles = [
    { type: "target" as const, position: Position.Top, x: width / 2 - 0.5, y: 0, width: 1, height: 1 },
    { type: "source" as const, position: Position.Bottom, x: width / 2 - 0.5, y: height - 1, width: 1, height: 1 },
  ];
  const base = { id: node.id, type: node.type, position, width, height, handles };
  switch (node.type) {
    case "step":
      // Boxes are neither dragged nor selected by the map itself, so their buttons need the pointer back.
      return { ...base, style: { pointerEvents: "all" }, data: { step: node.step, selected: node.step.stepId === selectedStepId } };
    case "missing":
      return { ...base, data: { target: node.target } };
    default:
      return { ...base, data: {} };
  }
}

const ZOOM = { duration: 200 };

/** The nodes in the top rows of the map, where the flow begins. */
function topNodes(nodes: readonly { id: string; position: { y: number } }[]): { id: string }[] {
  const top = Math.min(...nodes.map((n) => n.position.y));
  return nodes.filter((n) => n.position.y <= top + 600).map((n) => ({ id: n.id }));
}

function MapControls() {
  const { zoomIn, zoomOut, fitView } = useReactFlow();
  return (
    <Panel position="bottom-right" className="flex flex-col items-end gap-2">
      <Button aria-label="Zoom in" onClick={() => void zoomIn(ZOOM)}>
        <span aria-hidden="true" className="text-2xl leading-none">+</span>
      </Button>
      <Button aria-label="Zoom out" onClick={() => void zoomOut(ZOOM)}>
        <span aria-hidden="true" className="text-2xl leading-none">−</span>
      </Button>
      <Button onClick={() => void fitView(ZOOM)}>Whole flow</Button>
    </Panel>
  );
}

/** Brings the picked step into view when it lies off screen, keeping the zoom the tech chose. */
function FollowSelection({ selectedStepId }: { selectedStepId: string | null }) {
  const { getNode, getViewport, setCenter } = useReactFlow();
  const width = useStore((s) => s.width);
  const height = useStore((s) => s.height);
  useEffect(() => {
    if (selectedStepId === null || width === 0 || height === 0) return;
    const node = getNode(stepNodeId(selectedStepId));
    if (!node) return;
    const { x, y, zoom } = getViewport();
    const w = node.width ?? 0;
    const h = node.height ?? 0;
    const left = node.position.x * zoom + x;
    const top = node.position.y * zoom + y;
    const inView = left >= 0 && top >= 0 && left + w * zoom <= width && top + h * zoom <= height;
    if (!inView) void setCenter(node.position.x + w / 2, node.position.y + h / 2, { zoom, duration: 200 });
  }, [selectedStepId, width, height, getNode, getViewport, setCenter]);
  return null;
}

export function FlowGraph({ definition, problems, selectedStepId, onSelect }: FlowGraphProps) {
  const map = useMemo(() => readFlowMap(definition, problems), [definition, problems]);
  // Laid out again only when the shape changes, not when a title or a problem does.
  const shapeKey = useMemo(() => JSON.stringify(layoutShape(map)), [map]);
  const placement = useMemo(() => placeShape(JSON.parse(shapeKey) as LayoutShape), [shapeKey]);
  const nodes = useMemo(() => map.nodes.map((n) => toFlowNode(n, placement, selectedStepId)), [map, placement, selectedStepId]);
  const edges = useMemo(
    () =>
      map.edges.map(
        (e): MapFlowEdge => ({
          id: e.id,
          source: e.source,
          target: e.target,
          type: "way",
          className: e.broken ? "[--xy-edge-stroke:var(--color-problem)]" : undefined,
          data: { label: e.label, broken: e.broken, points: placement.edges[e.id]?.points ?? [], labelAt: placement.edges[e.id]?.label ?? null },
        }),
      ),
    [map, placement],
  );

  if (map.nodes.length === 0) {
    return <p className="rounded-lg border-2 border-dashed border-line-strong bg-raised p-6 text-ink-muted">This flow has no steps yet. Add a step and it appears here.</p>;
  }
  return (
    <SelectStepContext value={onSelect}>
      <section
        aria-label="Flow map"
        className="h-[65vh] min-h-96 w-full overflow-hidden rounded-lg border-2 border-line bg-surface [--xy-background-color:var(--color-surface)] [--xy-edge-stroke-width:2] [--xy-edge-stroke:var(--color-line-strong)]"
      >
        <ReactFlow
          nodes={nodes}
          edges={edges}
          nodeTypes={nodeTypes}
          edgeTypes={edgeTypes}
          fitView
          // A long flow opens on its first steps at a readable size, not shrunk to fit whole.
          fitViewOptions={{ nodes: topNodes(nodes), minZoom: 0.5, maxZoom: 1 }}
          minZoom={0.15}
          maxZoom={2}
          nodesDraggable={false}
          nodesConnectable={false}
          nodesFocusable={false}
          edgesFocusable={false}
          elementsSelectable={false}
          zoomOnDoubleClick={false}
          zoomOnPinch
          panOnDrag
        >
          <MapControls />
          <FollowSelection selectedStepId={selectedStepId} />
        </ReactFlow>
      </section>
    </SelectStepContext>
  );
}
