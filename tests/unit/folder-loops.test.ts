import { readdirSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import ts from 'typescript';
import { describe, expect, it } from 'vitest';

// A folder-level loop: files of folder A import files of folder B and files of B import (maybe through other
// folders) files of A. Type-only imports count: they tie the folders together just the same.
const root = fileURLToPath(new URL('../..', import.meta.url));
const scanned = ['server', 'src', 'shared'];

function compilerOptions(): ts.CompilerOptions {
  const configPath = path.join(root, 'tsconfig.json');
  const { config } = ts.readConfigFile(configPath, ts.sys.readFile);
  return ts.parseJsonConfigFileContent(config, ts.sys, root).options;
}

function sourceFiles(folder: string): string[] {
  return readdirSync(path.join(root, folder), { recursive: true, encoding: 'utf8' })
    .filter((file) => /\.tsx?$/.test(file) && !file.endsWith('.d.ts'))
    .map((file) => path.join(root, folder, file));
}

/** folder -> folder it imports -> the "file -> file" imports that make that edge */
export function folderGraph(folders: string[]): Map<string, Map<string, string[]>> {
  const options = compilerOptions();
  const graph = new Map<string, Map<string, string[]>>();
  const relative = (file: string) => path.relative(root, file);
  for (const file of folders.flatMap(sourceFiles)) {
    const { importedFiles } = ts.preProcessFile(ts.sys.readFile(file) ?? '', true, true);
    for (const { fileName } of importedFiles) {
      const resolved = ts.resolveModuleName(fileName, file, options, ts.sys).resolvedModule;
      if (!resolved || resolved.isExternalLibraryImport) continue;
      const from = path.dirname(relative(file));
      const to = path.dirname(relative(resolved.resolvedFileName));
      if (from === to || !scanned.some((top) => to === top || to.startsWith(`${top}/`))) continue;
      const edges = graph.get(from) ?? new Map<string, string[]>();
      graph.set(from, edges);
      edges.set(to, [...(edges.get(to) ?? []), `${relative(file)} -> ${relative(resolved.resolvedFileName)}`]);
    }
  }
  return graph;
}

/** Tarjan's strongly connected components; every component of more than one folder is a loop. */
export function folderLoops(graph: Map<string, Map<string, string[]>>): string[][] {
  const index = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const loops: string[][] = [];
  const visit = (folder: string) => {
    index.set(folder, index.size);
    low.set(folder, index.get(folder)!);
    stack.push(folder);
    for (const next of graph.get(folder)?.keys() ?? []) {
      if (!index.has(next)) {
        visit(next);
        low.set(folder, Math.min(low.get(folder)!, low.get(next)!));
      } else if (stack.includes(next)) {
        low.set(folder, Math.min(low.get(folder)!, index.get(next)!));
      }
    }
    if (low.get(folder) !== index.get(folder)) return;
    const component: string[] = [];
    let member: string;
    do {
      member = stack.pop()!;
      component.push(member);
    } while (member !== folder);
    if (component.length > 1) loops.push(component.sort());
  };
  for (const folder of graph.keys()) if (!index.has(folder)) visit(folder);
  return loops;
}

function describeLoop(graph: Map<string, Map<string, string[]>>, loop: string[]): string {
  const lines = loop.flatMap((from) =>
    [...(graph.get(from) ?? [])]
      .filter(([to]) => loop.includes(to))
      .map(([to, files]) => `  ${from} -> ${to}: ${files.join('; ')}`),
  );
  return `loop between ${loop.join(', ')}\n${lines.join('\n')}`;
}

describe('folder-level imports', () => {
  it('form no loop in server/, src/ or shared/', () => {
    const graph = folderGraph(scanned);
    expect(graph.size).toBeGreaterThan(10);
    expect(folderLoops(graph).map((loop) => describeLoop(graph, loop))).toEqual([]);
  });

  it('finds a loop when two folders import each other through a third', () => {
    const graph = new Map([
      ['a', new Map([['b', ['a/x.ts -> b/y.ts']]])],
      ['b', new Map([['c', ['b/y.ts -> c/z.ts']]])],
      ['c', new Map([['a', ['c/z.ts -> a/w.ts']]])],
      ['d', new Map([['a', ['d/v.ts -> a/x.ts']]])],
    ]);
    expect(folderLoops(graph)).toEqual([['a', 'b', 'c']]);
  });
});
