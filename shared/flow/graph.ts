// One forward and one reverse breadth-first pass: linear in steps plus edges, whatever the shape.

export interface StepGraph {
  /** Edges by node index. */
  edges: number[][];
  /** Nodes that end the walk well: findings, and in a section the ways out. */
  exits: boolean[];
}

export interface GraphReach {
  /** Reachable from the start. */
  reached: Uint8Array;
  /** Can reach an exit. */
  canExit: Uint8Array;
}

export function analyseGraph(graph: StepGraph, start: number | null): GraphReach {
  const n = graph.edges.length;
  const reached = new Uint8Array(n);
  const canExit = new Uint8Array(n);
  const queue = new Int32Array(n);

  if (start !== null) {
    let head = 0;
    let tail = 0;
    reached[start] = 1;
    queue[tail++] = start;
    while (head < tail) {
      for (const to of graph.edges[queue[head++]!]!) {
        if (!reached[to]) {
          reached[to] = 1;
          queue[tail++] = to;
        }
      }
    }
  }

  // Reverse adjacency in compressed form: offsets per target, then sources.
  const offsets = new Int32Array(n + 1);
  for (const targets of graph.edges) for (const to of targets) offsets[to + 1]!++;
  for (let i = 0; i < n; i++) offsets[i + 1]! += offsets[i]!;
  const fill = offsets.slice(0, n);
  const sources = new Int32Array(offsets[n]!);
  graph.edges.forEach((targets, from) => {
    for (const to of targets) sources[fill[to]!++] = from;
  });

  let head = 0;
  let tail = 0;
  for (let i = 0; i < n; i++) {
    if (graph.exits[i]) {
      canExit[i] = 1;
      queue[tail++] = i;
    }
  }
  while (head < tail) {
    const node = queue[head++]!;
    for (let k = offsets[node]!; k < offsets[node + 1]!; k++) {
      const from = sources[k]!;
      if (!canExit[from]) {
        canExit[from] = 1;
        queue[tail++] = from;
      }
    }
  }
  return { reached, canExit };
}
