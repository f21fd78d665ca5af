// One forward and one reverse breadth-first pass: linear in steps plus edges, whatever the shape.

/** Edges in compressed form: node i leads to targets[offsets[i]] .. targets[offsets[i + 1] - 1]. */
export interface StepGraph {
  offsets: Int32Array;
  targets: ArrayLike<number>;
  /** Nodes that end the walk well: findings, and in a section the ways out. */
  exits: Uint8Array;
}

export interface GraphReach {
  /** Reachable from the start. */
  reached: Uint8Array;
  /** Can reach an exit. */
  canExit: Uint8Array;
}

export function analyseGraph(graph: StepGraph, start: number | null): GraphReach {
  const { offsets, targets, exits } = graph;
  const n = offsets.length - 1;
  const reached = new Uint8Array(n);
  const canExit = new Uint8Array(n);
  const queue = new Int32Array(n);

  if (start !== null) {
    let head = 0;
    let tail = 0;
    reached[start] = 1;
    queue[tail++] = start;
    while (head < tail) {
      const node = queue[head++]!;
      for (let k = offsets[node]!; k < offsets[node + 1]!; k++) {
        const to = targets[k]!;
        if (!reached[to]) {
          reached[to] = 1;
          queue[tail++] = to;
        }
      }
    }
  }

  // The same edges reversed, by counting sort: offsets per target, then the sources.
  const into = new Int32Array(n + 1);
  for (let k = 0; k < targets.length; k++) into[targets[k]! + 1]!++;
  for (let i = 0; i < n; i++) into[i + 1]! += into[i]!;
  const fill = into.slice(0, n);
  const sources = new Int32Array(targets.length);
  for (let from = 0; from < n; from++) {
    for (let k = offsets[from]!; k < offsets[from + 1]!; k++) sources[fill[targets[k]!]!++] = from;
  }

  let head = 0;
  let tail = 0;
  for (let i = 0; i < n; i++) {
    if (exits[i]) {
      canExit[i] = 1;
      queue[tail++] = i;
    }
  }
  while (head < tail) {
    const node = queue[head++]!;
    for (let k = into[node]!; k < into[node + 1]!; k++) {
      const from = sources[k]!;
      if (!canExit[from]) {
        canExit[from] = 1;
        queue[tail++] = from;
      }
    }
  }
  return { reached, canExit };
}
