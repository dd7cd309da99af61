import { LabelPlacer, textWidth as textWidthAt, type Box, type PlacedLabel, type Spot } from './label-layout';

/** Words split into lines of at most `most` characters (a longer word stands on its own line). */
function wrap(text: string, most: number): string[] {
  const lines: string[] = [];
  let current = '';
  for (const word of text.split(' ')) {
    if (current && current.length + 1 + word.length > most) {
      lines.push(current);
      current = word;
    } else current = current ? `${current} ${word}` : word;
  }
  if (current) lines.push(current);
  return lines;
}

export type Side = 'left' | 'right';

/**
 * What the plan view draws, in feet, as seen from above with the road along the bottom and the driveway running up
 * the page into the property. Left and right are as for someone on the road edge facing into the property.
 * Anything left out is not drawn, and the notes under the drawing say so.
 */
export interface PlanViewInput {
  roadName?: string;
  /** + rises to the right, as the check's road grade is entered. */
  roadGradePercent?: number;
  roadWidthFt?: number;
  /** From the road edge to the right-of-way line, along the driveway. */
  rightOfWayFt?: number;
  /** The direction the driveway runs into the property, degrees clockwise from north. */
  bearingDeg?: number;
  /** From the road edge to the last surveyed shot. */
  drivewayLengthFt: number;
  widthFt?: number;
  flareRadiusFt?: number;
  culvert?: {
    diameterIn: number;
    material?: string;
    lengthFt?: number;
    /** The length is the one the check worked out, not one entered. */
    lengthWorkedOut?: boolean;
    /** From the road edge, along the driveway. */
    offsetFt: number;
    offsetAssumed: boolean;
    inletSide: Side;
    inletSideAssumed: boolean;
    inletInvertFt: number;
    outletInvertFt: number;
  };
  sight?: {
    left: { measuredFt?: number; requiredFt: number };
    /** requiredFt null: right turns only, nothing to see to the right. */
    right: { measuredFt?: number; requiredFt: number | null };
  };
  intersection?: { distanceFt: number; side?: Side; name?: string };
  propertyLine?: { distanceFt: number; side?: Side };
  width?: number;
  height?: number;
  fontFamily?: string;
}

export const planColors = {
  road: '#e4e1da',
  roadEdge: '#4a4d4b',
  lane: '#b7791f',
  drive: '#f1f6f2',
  driveEdge: '#1d4a38',
  culvert: '#3f6a8a',
  rightOfWay: '#7a5c3e',
  pass: '#1d4a38',
  fail: '#9c4a2f',
  text: '#1c1f1d',
  muted: '#5d615e',
};

/** Where a driver waits to look along the road, back from its edge (AASHTO Green Book decision point, from memory). */
export const EYE_SETBACK_FT = 14.5;
const FONT_SIZE = 10;
const MAX_DRAWN_LENGTH_FT = 150;
const SCALE_BAR_FEET = [5, 10, 20, 25, 50, 100, 200, 250, 500];

export interface PlanViewLayout {
  width: number;
  height: number;
  /** Pixels (or points) per foot of the at-scale drawing. */
  scale: number;
  scaleBar: { feet: number; length: number; box: Box };
  /** Null when no bearing is known: no north arrow is drawn. */
  north: { box: Box; dx: number; dy: number } | null;
  labels: PlacedLabel[];
  /** What the drawing leaves out and why, and any label there was no room for; printed under the drawing. */
  notes: string[];
  shapes: string[];
}

const n = (v: number) => (Math.round(v * 10) / 10).toString();
const esc = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const feet = (v: number) => `${Math.round(v * 10) / 10} ft`;
const sideSign = (side: Side) => (side === 'left' ? -1 : 1);

/** The scale bar's length: the longest round length that fits in about a fifth of the drawing's width. */
export function scaleBarFeet(scale: number, drawingWidth: number): number {
  const room = drawingWidth / 5;
  const fits = SCALE_BAR_FEET.filter((f) => f * scale <= room);
  return fits[fits.length - 1] ?? SCALE_BAR_FEET[0];
}

/** The whole drawing worked out: shapes, placed labels, notes. planViewSvg wraps it in an svg element. */
export function planViewLayout(input: PlanViewInput): PlanViewLayout {
  const width = input.width ?? 760;
  const height = input.height ?? 520;
  const notes: string[] = [];
  const shapes: string[] = [];

  const halfWidth = input.widthFt !== undefined ? input.widthFt / 2 : undefined;
  const flare = input.flareRadiusFt ?? 0;
  const roadWidth = input.roadWidthFt ?? 24;
  const length = Math.min(Math.max(input.drivewayLengthFt, 10), MAX_DRAWN_LENGTH_FT);

  if (input.roadWidthFt === undefined)
    notes.push('Road width not given: the road is drawn 24 ft wide to show its lanes.');
  if (input.roadGradePercent === undefined) notes.push('Road grade not given: no rising-grade arrow.');
  if (input.rightOfWayFt === undefined)
    notes.push('Right-of-way line not shown: its distance from the road edge was not given.');
  if (input.widthFt === undefined) notes.push('Entrance width not given: only the centreline is drawn.');
  else if (input.flareRadiusFt === undefined) notes.push('Flare radius not given: the corners are drawn square.');
  if (!input.culvert) notes.push('No culvert in the check.');
  if (!input.sight) notes.push('Sight distances not checked: no sight lines drawn.');
  if (!input.intersection) notes.push('Nearest intersection not given.');
  if (!input.propertyLine) notes.push('Side property line not given.');
  if (input.bearingDeg === undefined) notes.push('Bearing not given: no north arrow.');
  if (input.drivewayLengthFt > MAX_DRAWN_LENGTH_FT)
    notes.push(`Driveway drawn for its first ${MAX_DRAWN_LENGTH_FT} ft of ${feet(input.drivewayLengthFt)}.`);

  // How far across the road the drawing must reach to hold the entrance, its culvert and a near property line.
  const sideReach = Math.max(
    45,
    (halfWidth ?? 8) + flare + 20,
    input.culvert?.lengthFt !== undefined ? input.culvert.lengthFt / 2 + 20 : 0,
    input.propertyLine && input.propertyLine.distanceFt <= 120
      ? (halfWidth ?? 0) + input.propertyLine.distanceFt + 20
      : 0,
  );
  const top = Math.max(length, (input.rightOfWayFt ?? 0) + 10, 30) + 8;
  const bottom = -roadWidth - 14;

  const noteLines = () => notes.length;
  // The notes are known before the frame is sized, except the labels with no room, which are few; room for 3 more.
  const notesHeight = (noteLines() + 3) * FONT_SIZE * 1.35 + 6;
  const frame: Box = { x: 8, y: 8, width: width - 16, height: height - 16 - notesHeight - 30 };
  const scale = Math.min(frame.width / (2 * sideReach), frame.height / (top - bottom));
  const cx = frame.x + frame.width / 2;
  const baseY = frame.y + frame.height - -bottom * scale;
  const reachX = frame.width / 2 / scale;
  const X = (x: number) => cx + x * scale;
  const Y = (y: number) => baseY - y * scale;
  const line = (x1: number, y1: number, x2: number, y2: number, stroke: string, w = 1, dash = '') =>
    `<line x1="${n(X(x1))}" y1="${n(Y(y1))}" x2="${n(X(x2))}" y2="${n(Y(y2))}" stroke="${stroke}" stroke-width="${w}"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`;

  const placer = new LabelPlacer(frame, FONT_SIZE);

  // North arrow, top right, only with a bearing: north on the page is the driveway's direction turned back by it.
  let north: PlanViewLayout['north'] = null;
  if (input.bearingDeg !== undefined) {
    const r = 18;
    const ncx = frame.x + frame.width - r - 6;
    const ncy = frame.y + r + 16;
    const rad = (input.bearingDeg * Math.PI) / 180;
    const dx = -Math.sin(rad);
    const dy = -Math.cos(rad);
    const box = { x: ncx - r - 12, y: ncy - r - 16, width: 2 * r + 24, height: 2 * r + 32 };
    placer.reserve(box);
    north = { box, dx, dy };
    const tip = { x: ncx + dx * r, y: ncy + dy * r };
    const tail = { x: ncx - dx * r, y: ncy - dy * r };
    const wing = (s: number) => ({ x: ncx - dy * 6 * s - dx * 4, y: ncy + dx * 6 * s - dy * 4 });
    shapes.push(
      `<circle cx="${n(ncx)}" cy="${n(ncy)}" r="${r}" fill="#ffffff" stroke="${planColors.muted}" stroke-width="0.8"/>`,
      `<line x1="${n(tail.x)}" y1="${n(tail.y)}" x2="${n(tip.x)}" y2="${n(tip.y)}" stroke="${planColors.text}" stroke-width="1.2"/>`,
      `<polygon points="${n(tip.x)},${n(tip.y)} ${n(wing(1).x)},${n(wing(1).y)} ${n(wing(-1).x)},${n(wing(-1).y)}" fill="${planColors.text}"/>`,
      `<text x="${n(ncx + dx * (r + 9))}" y="${n(ncy + dy * (r + 9) + 4)}" text-anchor="middle" font-size="11" font-weight="bold" fill="${planColors.text}" data-role="north">N</text>`,
    );
  }

  // Scale bar, under the drawing at the left.
  const barFeet = scaleBarFeet(scale, frame.width);
  const barLength = barFeet * scale;
  const barY = frame.y + frame.height + 14;
  const barBox = { x: frame.x, y: barY - 6, width: barLength + 70, height: 22 };
  const half = barLength / 2;
  shapes.push(
    `<rect x="${n(frame.x)}" y="${n(barY)}" width="${n(half)}" height="5" fill="${planColors.text}"/>`,
    `<rect x="${n(frame.x + half)}" y="${n(barY)}" width="${n(half)}" height="5" fill="#ffffff" stroke="${planColors.text}" stroke-width="0.8"/>`,
    `<text x="${n(frame.x)}" y="${n(barY + 15)}" font-size="9" fill="${planColors.text}" data-role="scale">0</text>`,
    `<text x="${n(frame.x + barLength + 4)}" y="${n(barY + 6)}" font-size="9" fill="${planColors.text}" data-role="scale">${barFeet} ft</text>`,
  );

  // The road, its edge, its centre line and the far edge (dashed when its width is a guess).
  shapes.push(
    `<rect x="${n(frame.x)}" y="${n(Y(0))}" width="${n(frame.width)}" height="${n(roadWidth * scale)}" fill="${planColors.road}"/>`,
    line(-reachX, 0, reachX, 0, planColors.roadEdge, 1.6),
    line(
      -reachX,
      -roadWidth,
      reachX,
      -roadWidth,
      planColors.roadEdge,
      1.2,
      input.roadWidthFt === undefined ? '6 4' : '',
    ),
    line(-reachX, -roadWidth / 2, reachX, -roadWidth / 2, planColors.lane, 1, '10 6'),
  );

  // The driveway: its outline with the flares turning out to the road edge, and its centreline.
  if (halfWidth !== undefined) {
    const r = flare * scale;
    const outline =
      flare > 0
        ? `M${n(X(-halfWidth - flare))} ${n(Y(0))} A${n(r)} ${n(r)} 0 0 0 ${n(X(-halfWidth))} ${n(Y(flare))} L${n(X(-halfWidth))} ${n(Y(length))} L${n(X(halfWidth))} ${n(Y(length))} L${n(X(halfWidth))} ${n(Y(flare))} A${n(r)} ${n(r)} 0 0 0 ${n(X(halfWidth + flare))} ${n(Y(0))} Z`
        : `M${n(X(-halfWidth))} ${n(Y(0))} L${n(X(-halfWidth))} ${n(Y(length))} L${n(X(halfWidth))} ${n(Y(length))} L${n(X(halfWidth))} ${n(Y(0))} Z`;
    shapes.push(
      `<path d="${outline}" fill="${planColors.drive}" stroke="${planColors.driveEdge}" stroke-width="1.4"/>`,
    );
  }
  shapes.push(line(0, 0, 0, length, planColors.driveEdge, 1, '12 4 2 4'));

  // The right-of-way line across the frame.
  if (input.rightOfWayFt !== undefined)
    shapes.push(line(-reachX, input.rightOfWayFt, reachX, input.rightOfWayFt, planColors.rightOfWay, 1.2, '14 4 3 4'));

  // The side property line, or an arrow at the frame's edge when it is further than the drawing reaches.
  const propertyLine = input.propertyLine;
  let propertyX: number | undefined;
  if (propertyLine?.side) {
    const at = sideSign(propertyLine.side) * ((halfWidth ?? 0) + propertyLine.distanceFt);
    if (Math.abs(at) < reachX - 2) {
      propertyX = at;
      shapes.push(line(at, input.rightOfWayFt ?? 0, at, top - 2, planColors.rightOfWay, 1.2, '14 4 3 4'));
    }
  } else if (propertyLine)
    notes.push(`Side property line ${feet(propertyLine.distanceFt)} from the entrance; side not given.`);

  // The culvert along the ditch, under the driveway, with its ends.
  const culvert = input.culvert;
  const culvertLength = culvert ? (culvert.lengthFt ?? Math.max((halfWidth ?? 8) * 2 + 2 * flare, 16)) : 0;
  if (culvert) {
    const y = culvert.offsetFt;
    const w = Math.max(3, (culvert.diameterIn / 12) * scale);
    shapes.push(
      `<line x1="${n(X(-culvertLength / 2))}" y1="${n(Y(y))}" x2="${n(X(culvertLength / 2))}" y2="${n(Y(y))}" stroke="${planColors.culvert}" stroke-width="${n(w)}" stroke-linecap="butt"${culvert.lengthFt === undefined ? ' stroke-dasharray="6 3"' : ''}/>`,
      line(-culvertLength / 2, y - 2, -culvertLength / 2, y + 2, planColors.culvert, 2),
      line(culvertLength / 2, y - 2, culvertLength / 2, y + 2, planColors.culvert, 2),
    );
    if (culvert.lengthFt === undefined)
      notes.push('Culvert length not given or worked out: drawn across the entrance only.');
    if (culvert.offsetAssumed)
      notes.push('Culvert station not given: drawn at the lowest surveyed shot near the road edge.');
    if (culvert.inletSideAssumed)
      notes.push('Culvert inlet end not given or told by the road grade: inlet drawn left.');
  }

  // Sight lines from the driver's position along the near lane, cut at the frame with the distances written.
  const eyeY = Math.min(EYE_SETBACK_FT, length);
  const laneY = -roadWidth / 4;
  const sightLabels: { side: Side; text: string; fill: string }[] = [];
  if (input.sight) {
    for (const side of ['left', 'right'] as const) {
      const s = input.sight[side];
      const sign = sideSign(side);
      if (s.requiredFt === null) {
        sightLabels.push({ side, text: `Looking ${side}: right turns only, nothing required`, fill: planColors.muted });
        continue;
      }
      const measured = s.measuredFt;
      const passes = measured !== undefined && measured >= s.requiredFt;
      const fill = measured === undefined ? planColors.muted : passes ? planColors.pass : planColors.fail;
      const reach = measured ?? s.requiredFt;
      const endX = sign * Math.min(reach, reachX);
      const t = Math.abs(endX) / reach;
      shapes.push(line(0, eyeY, endX, eyeY + (laneY - eyeY) * t, fill, 1.2, '5 3'));
      if (Math.abs(endX) < reach) {
        // A break mark where the line leaves the drawing: it goes on beyond the scale.
        const bx = X(endX) - sign * 6;
        const by = Y(eyeY + (laneY - eyeY) * t);
        shapes.push(
          `<path d="M${n(bx - 4)} ${n(by + 6)} L${n(bx)} ${n(by - 6)} M${n(bx + 2)} ${n(by + 6)} L${n(bx + 6)} ${n(by - 6)}" stroke="${fill}" stroke-width="1"/>`,
        );
      }
      const words =
        measured === undefined
          ? `Looking ${side}: not measured, ${feet(s.requiredFt)} required`
          : `Looking ${side}: ${feet(measured)} measured, ${feet(s.requiredFt)} required`;
      sightLabels.push({ side, text: words, fill });
    }
    shapes.push(`<circle cx="${n(X(0))}" cy="${n(Y(eyeY))}" r="3" fill="${planColors.text}" data-role="eye"/>`);
  }

  // The nearest intersection: drawn when it falls in the frame, else an arrow at the frame's edge.
  const intersection = input.intersection;
  let intersectionX: number | undefined;
  if (intersection?.side) {
    const at = sideSign(intersection.side) * intersection.distanceFt;
    if (Math.abs(at) + 12 < reachX) {
      intersectionX = at;
      shapes.push(
        `<rect x="${n(X(at - 10))}" y="${n(Y(-roadWidth))}" width="${n(20 * scale)}" height="${n((-roadWidth - bottom) * scale)}" fill="${planColors.road}"/>`,
      );
    } else {
      const ex = X(sideSign(intersection.side) * (reachX - 2));
      const ey = Y(-roadWidth - 6);
      const sign = sideSign(intersection.side);
      shapes.push(
        `<path d="M${n(ex - sign * 14)} ${n(ey)} L${n(ex)} ${n(ey)} M${n(ex - sign * 5)} ${n(ey - 4)} L${n(ex)} ${n(ey)} L${n(ex - sign * 5)} ${n(ey + 4)}" stroke="${planColors.text}" stroke-width="1.2" fill="none"/>`,
      );
    }
  } else if (intersection)
    notes.push(`Nearest intersection ${feet(intersection.distanceFt)} away; side not given, so not drawn.`);

  // Labels, the most important first; each offers a few spots near what it names.
  const left = frame.x + 4;
  const right = frame.x + frame.width - 4;
  const spotsAt = (x: number, y: number, dy = 0): Spot[] => [
    { x: X(x) + 6, y: Y(y) + dy - 4, anchor: 'start' },
    { x: X(x) - 6, y: Y(y) + dy - 4, anchor: 'end' },
    { x: X(x), y: Y(y) + dy + 14, anchor: 'middle' },
  ];
  const roadLabel = input.roadName ? `Edge of ${input.roadName}` : 'Road edge';
  placer.place(roadLabel, [
    { x: left, y: Y(0) + 13, anchor: 'start' },
    { x: right, y: Y(0) + 13, anchor: 'end' },
  ]);
  for (const label of sightLabels) {
    const edge = label.side === 'left' ? left : right;
    const anchor = label.side === 'left' ? 'start' : 'end';
    placer.place(
      label.text,
      [
        { x: edge, y: Y(laneY) - 4, anchor },
        { x: edge, y: Y(eyeY) - 4, anchor },
      ],
      {
        fill: label.fill,
      },
    );
  }
  if (input.roadGradePercent !== undefined) {
    const g = input.roadGradePercent;
    const y = Y(-roadWidth * 0.75);
    if (g === 0) placer.place('Road level along its length', [{ x: cx, y: y + 4, anchor: 'middle' }]);
    else {
      const sign = g > 0 ? 1 : -1;
      const text = `Road rises ${Math.abs(g)}% this way`;
      const label = placer.place(text, [
        { x: cx + sign * 40, y: y + 4, anchor: sign > 0 ? 'start' : 'end' },
        { x: cx - sign * 40, y: y + 4, anchor: sign > 0 ? 'start' : 'end' },
      ]);
      if (label) {
        const tipX = sign > 0 ? label.x + label.width + 22 : label.x - 22;
        const fromX = sign > 0 ? label.x + label.width + 4 : label.x - 4;
        shapes.push(
          `<path d="M${n(fromX)} ${n(y)} L${n(tipX)} ${n(y)} M${n(tipX - sign * 6)} ${n(y - 4)} L${n(tipX)} ${n(y)} L${n(tipX - sign * 6)} ${n(y + 4)}" stroke="${planColors.text}" stroke-width="1.4" fill="none" data-role="rising"/>`,
        );
        placer.reserve({ x: Math.min(fromX, tipX), y: y - 5, width: 22, height: 10 });
      }
    }
  }
  if (halfWidth !== undefined) {
    const dimY = length * 0.7;
    shapes.push(line(-halfWidth, dimY, halfWidth, dimY, planColors.driveEdge, 0.8));
    placer.place(`Width ${feet(input.widthFt!)}`, [
      { x: X(halfWidth) + 6, y: Y(dimY) + 4, anchor: 'start' },
      { x: X(-halfWidth) - 6, y: Y(dimY) + 4, anchor: 'end' },
      ...spotsAt(0, dimY, -4),
    ]);
    if (flare > 0)
      placer.place(`Flare radius ${feet(flare)}`, [
        { x: X(halfWidth + flare) + 4, y: Y(flare) - 2, anchor: 'start' },
        { x: X(-halfWidth - flare) - 4, y: Y(flare) - 2, anchor: 'end' },
      ]);
  }
  placer.place('Driveway centreline', [
    { x: X(0) + 6, y: Y(length) + 12, anchor: 'start' },
    { x: X(0) - 6, y: Y(length) + 12, anchor: 'end' },
    ...spotsAt(0, length * 0.5),
  ]);
  if (culvert) {
    const inletX = sideSign(culvert.inletSide) * (culvertLength / 2);
    const lengthWords =
      culvert.lengthFt === undefined
        ? ''
        : `, ${feet(culvert.lengthFt)}${culvert.lengthWorkedOut ? ' (worked out)' : ''}`;
    placer.place(
      `Culvert ${culvert.diameterIn} in${culvert.material ? ` ${culvert.material}` : ''}${lengthWords}`,
      [
        { x: X(0), y: Y(culvert.offsetFt) - 8, anchor: 'middle' },
        { x: X(0), y: Y(culvert.offsetFt) + 16, anchor: 'middle' },
      ],
      { fill: planColors.culvert },
    );
    const endSpots = (x: number): Spot[] => {
      const out = x < 0 ? 'end' : 'start';
      return [
        { x: X(x) + (x < 0 ? -6 : 6), y: Y(culvert.offsetFt) + 4, anchor: out },
        { x: X(x), y: Y(culvert.offsetFt) + 16, anchor: 'middle' },
        { x: X(x), y: Y(culvert.offsetFt) - 8, anchor: 'middle' },
      ];
    };
    placer.place(`Inlet, invert ${culvert.inletInvertFt.toFixed(2)} ft`, endSpots(inletX), {
      fill: planColors.culvert,
    });
    placer.place(`Outlet, invert ${culvert.outletInvertFt.toFixed(2)} ft`, endSpots(-inletX), {
      fill: planColors.culvert,
    });
  }
  if (input.rightOfWayFt !== undefined) {
    const y = Y(input.rightOfWayFt);
    placer.place(`Right-of-way line, ${feet(input.rightOfWayFt)} from road edge`, [
      { x: left, y: y - 4, anchor: 'start' },
      { x: right, y: y - 4, anchor: 'end' },
      { x: left, y: y + 12, anchor: 'start' },
    ]);
  }
  if (propertyLine?.side) {
    const text = `Property line, ${feet(propertyLine.distanceFt)} from the entrance`;
    if (propertyX !== undefined) placer.place(text, spotsAt(propertyX, top - 12));
    else
      placer.place(`${text} (beyond the drawing)`, [
        {
          x: propertyLine.side === 'left' ? left : right,
          y: Y(top - 10),
          anchor: propertyLine.side === 'left' ? 'start' : 'end',
        },
      ]);
  }
  if (intersection?.side) {
    const text = `Nearest intersection${intersection.name ? ` (${intersection.name})` : ''}, ${feet(intersection.distanceFt)}`;
    if (intersectionX !== undefined) placer.place(text, spotsAt(intersectionX, -roadWidth - 8, 8));
    else {
      const edge = intersection.side === 'left' ? left : right;
      placer.place(text, [
        {
          x: edge + (intersection.side === 'left' ? 18 : -18),
          y: Y(-roadWidth - 6) + 4,
          anchor: intersection.side === 'left' ? 'start' : 'end',
        },
      ]);
    }
  }
  for (const text of placer.unplaced) notes.push(`${text} (no room on the drawing)`);

  // Notes under the scale bar, each wrapped to the drawing's width.
  const notesTop = frame.y + frame.height + 44;
  const noteSize = 9;
  const perLine = Math.max(20, Math.floor(frame.width / (noteSize * 0.62)));
  const noteRows = notes.flatMap((note) => wrap(note, perLine));
  noteRows.forEach((row, i) => {
    placer.placed.push({
      text: row,
      x: frame.x,
      y: notesTop + i * FONT_SIZE * 1.35 - FONT_SIZE,
      width: textWidthAt(row, noteSize),
      height: FONT_SIZE * 1.3,
      textX: frame.x,
      textY: notesTop + i * FONT_SIZE * 1.35,
      fill: planColors.muted,
      bold: false,
      note: true,
    });
  });
  const notesBottom = notesTop + noteRows.length * FONT_SIZE * 1.35 + 4;

  return {
    width,
    height: Math.max(height, notesBottom),
    scale,
    scaleBar: { feet: barFeet, length: barLength, box: barBox },
    north,
    labels: placer.placed,
    notes,
    shapes,
  };
}

/** The plan view as one SVG string, for the live check, the field sheet and the permit packet alike. */
export function planViewSvg(input: PlanViewInput): string {
  const layout = planViewLayout(input);
  const font = esc(input.fontFamily ?? 'sans-serif');
  const labels = layout.labels
    .map((l) => {
      const isNote = l.note === true;
      const halo = isNote
        ? ''
        : `<rect x="${n(l.x - 1)}" y="${n(l.y)}" width="${n(l.width + 2)}" height="${n(l.height)}" fill="#ffffff" fill-opacity="0.8"/>`;
      return `${halo}<text x="${n(l.textX)}" y="${n(l.textY)}" font-size="${isNote ? 9 : FONT_SIZE}" fill="${l.fill}"${l.bold ? ' font-weight="bold"' : ''}>${esc(l.text)}</text>`;
    })
    .join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 ${layout.width} ${n(layout.height)}" width="${layout.width}" height="${n(layout.height)}" role="img" aria-label="Plan view of the entrance" font-family="${font}"><rect x="0" y="0" width="${layout.width}" height="${n(layout.height)}" fill="#ffffff"/>${layout.shapes.join('')}${labels}</svg>`;
}
