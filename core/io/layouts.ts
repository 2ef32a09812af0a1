/**
 * The registry of file layouts. The importer asks each registered layout whether it recognises a
 * file and lets the most confident one read it; nothing else in the importer knows the layouts.
 * A layout is one module implementing FileLayout (core/io/layout-types.ts); add it to BUILT_IN
 * below, or at run time with `registerLayout` (docs/architecture.md, "Adding a file layout").
 */
import type { FileLayout, LayoutMatch, LayoutSample } from './layout-types';
import { longLayout } from './layout-long';
import { perIsothermLayout } from './layout-per-isotherm';
import { wideLayout } from './layout-wide';

const BUILT_IN: readonly FileLayout[] = [wideLayout, longLayout, perIsothermLayout];

const registry: FileLayout[] = [...BUILT_IN];

/** The registered layouts, in the order they are asked. */
export function fileLayouts(): readonly FileLayout[] {
  return registry;
}

/**
 * Adds a layout to the registry (after the others: on equal confidence the earlier one wins).
 * Returns a function that removes it again. Throws when the id is taken.
 */
export function registerLayout(layout: FileLayout): () => void {
  if (registry.some((l) => l.id === layout.id))
    throw new RangeError(`A file layout with the id "${layout.id}" is already registered.`);
  registry.push(layout);
  return () => {
    const at = registry.indexOf(layout);
    if (at >= 0) registry.splice(at, 1);
  };
}

/** The registered layout with this id; throws naming the id when there is none. */
export function layoutById(id: string): FileLayout {
  const layout = registry.find((l) => l.id === id);
  if (!layout) throw new RangeError(`No file layout with the id "${id}" is registered.`);
  return layout;
}

/** Name and description of a layout for people; the id itself for one no longer registered. */
export function layoutText(id: string): { name: string; description: string } {
  const layout = registry.find((l) => l.id === id);
  return layout
    ? { name: layout.name, description: layout.description }
    : { name: id, description: id };
}

/** The most confident layout for a file (the first registered on a tie), with its evidence. */
export function recogniseLayout(sample: LayoutSample): { layout: FileLayout; match: LayoutMatch } {
  let best: { layout: FileLayout; match: LayoutMatch } | undefined;
  for (const layout of registry) {
    const match = layout.recognise(sample);
    if (match && match.confidence > 0 && (!best || match.confidence > best.match.confidence))
      best = { layout, match };
  }
  if (!best) throw new RangeError(`No registered file layout recognises ${sample.file}.`);
  return best;
}
