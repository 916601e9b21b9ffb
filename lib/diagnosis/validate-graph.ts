import type { DxTree, TreeProblem } from "./types";

const q = (id: string) => JSON.stringify(id);

/** Successor lists over existing nodes only; missing targets are dangling_edge problems. */
function successors(tree: DxTree, index: Map<string, number>): number[][] {
  const next: number[][] = tree.nodes.map(() => []);
  for (const option of tree.options) {
    const from = index.get(option.nodeId);
    const to = option.to === null ? undefined : index.get(option.to);
    if (from !== undefined && to !== undefined) next[from].push(to);
  }
  return next;
}

export function graphProblems(tree: DxTree): TreeProblem[] {
  const problems: TreeProblem[] = [];
  const index = new Map<string, number>();
  tree.nodes.forEach((n, i) => {
    if (!index.has(n.id)) index.set(n.id, i);
  });

  for (const option of tree.options) {
    if (!index.has(option.nodeId)) {
      problems.push({
        code: "dangling_edge",
        optionId: option.id,
        message: `Option ${q(option.id)} belongs to node ${q(option.nodeId)}, which does not exist`,
      });
    } else if (option.to !== null && !index.has(option.to)) {
      problems.push({
        code: "dangling_edge",
        nodeId: option.nodeId,
        optionId: option.id,
        message: `Option ${q(option.id)} of node ${q(option.nodeId)} leads to node ${q(option.to)}, which does not exist`,
      });
    }
  }

  const next = successors(tree, index);
  problems.push(...cycleProblems(tree, next));

  const root = index.get(tree.rootId);
  if (root === undefined) {
    problems.unshift({ code: "no_root", message: `The tree's root ${q(tree.rootId)} is not one of its nodes` });
    return problems;
  }
  const seen = new Uint8Array(tree.nodes.length);
  const stack = [root];
  seen[root] = 1;
  while (stack.length > 0) {
    for (const m of next[stack.pop() as number]) {
      if (!seen[m]) {
        seen[m] = 1;
        stack.push(m);
      }
    }
  }
  tree.nodes.forEach((node, i) => {
    if (!seen[i] && index.get(node.id) === i) {
      problems.push({ code: "unreachable", nodeId: node.id, message: `Node ${q(node.id)} cannot be reached from the root ${q(tree.rootId)}` });
    }
  });
  return problems;
}

/** Iterative depth-first search; each distinct cycle (by its set of nodes) is reported once. */
function cycleProblems(tree: DxTree, next: number[][]): TreeProblem[] {
  const problems: TreeProblem[] = [];
  const reported = new Set<string>();
  const state = new Uint8Array(tree.nodes.length); // 0 new, 1 on the path, 2 done
  const path: number[] = [];
  const cursor: number[] = [];

  for (let start = 0; start < tree.nodes.length; start++) {
    if (state[start]) continue;
    path.push(start);
    cursor.push(0);
    state[start] = 1;
    while (path.length > 0) {
      const top = path.length - 1;
      const n = path[top];
      if (cursor[top] >= next[n].length) {
        state[n] = 2;
        path.pop();
        cursor.pop();
        continue;
      }
      const m = next[n][cursor[top]++];
      if (state[m] === 0) {
        state[m] = 1;
        path.push(m);
        cursor.push(0);
      } else if (state[m] === 1) {
        const loop = path.slice(path.indexOf(m));
        const key = [...loop].sort((a, b) => a - b).join(",");
        if (reported.has(key)) continue;
        reported.add(key);
        const ids = loop.map((i) => tree.nodes[i].id);
        problems.push({
          code: "cycle",
          nodeId: ids[0],
          message: `Nodes ${[...ids, ids[0]].map(q).join(" → ")} form a cycle`,
        });
      }
    }
  }
  return problems;
}
