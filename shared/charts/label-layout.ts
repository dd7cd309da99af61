/** A label's box on the drawing, in the drawing's own units (SVG user units or PDF points). */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

export interface PlacedLabel extends Box {
  text: string;
  /** Where the text's baseline starts. */
  textX: number;
  textY: number;
  fill: string;
  bold: boolean;
  /** A line of the notes under the drawing, set smaller. */
  note?: boolean;
}

export type Anchor = 'start' | 'middle' | 'end';

/** One spot a label may go: the point it is set from and how the text runs from it. */
export interface Spot {
  x: number;
  y: number;
  anchor: Anchor;
}

/**
 * Width of a line of text, set wide on purpose: wider than the average glyph of the sans-serif fonts the screen uses
 * and of the serif the PDF embeds, so a box that does not overlap here does not overlap when drawn.
 */
export const textWidth = (text: string, fontSize: number) => text.length * fontSize * 0.62;

export const overlaps = (a: Box, b: Box) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

export const inside = (box: Box, frame: Box) =>
  box.x >= frame.x &&
  box.y >= frame.y &&
  box.x + box.width <= frame.x + frame.width &&
  box.y + box.height <= frame.y + frame.height;

/**
 * Places labels one by one in the order given (the most important first), each at the first of its spots, or the
 * first shifted up or down by whole lines, whose box stays in the frame and clear of every box already taken.
 * A label with no room left is handed back instead, for the notes under the drawing.
 */
export class LabelPlacer {
  readonly placed: PlacedLabel[] = [];
  readonly unplaced: string[] = [];
  private readonly taken: Box[] = [];

  constructor(
    private readonly frame: Box,
    private readonly fontSize: number,
  ) {}

  /** A part of the drawing labels must keep off (the north arrow, the scale bar). */
  reserve(box: Box) {
    this.taken.push(box);
  }

  boxFor(text: string, spot: Spot): Box {
    const width = textWidth(text, this.fontSize);
    const height = this.fontSize * 1.3;
    const x = spot.anchor === 'start' ? spot.x : spot.anchor === 'middle' ? spot.x - width / 2 : spot.x - width;
    return { x, y: spot.y - this.fontSize, width, height };
  }

  place(
    text: string,
    spots: readonly Spot[],
    opts: {
      fill?: string;
      bold?: boolean;
      /** How many whole lines up or down a label may move (14). */ shifts?: number;
    } = {},
  ): PlacedLabel | null {
    const line = this.fontSize * 1.35;
    const tries: Spot[] = [...spots];
    for (let k = 1; k <= (opts.shifts ?? 14); k += 1)
      for (const spot of spots) tries.push({ ...spot, y: spot.y - k * line }, { ...spot, y: spot.y + k * line });
    for (const spot of tries) {
      const box = this.boxFor(text, spot);
      if (!inside(box, this.frame) || this.taken.some((t) => overlaps(t, box))) continue;
      const label: PlacedLabel = {
        ...box,
        text,
        textX: box.x,
        textY: spot.y,
        fill: opts.fill ?? '#1c1f1d',
        bold: opts.bold ?? false,
      };
      this.taken.push(box);
      this.placed.push(label);
      return label;
    }
    this.unplaced.push(text);
    return null;
  }
}
