import { within } from './errors';
import { inletControlHeadwater, type InletType } from './inlet-control';
import { outletControlHeadwater } from './outlet-control';

export interface ControllingHeadwater {
  headwaterFt: number;
  hwOverD: number;
  control: 'inlet' | 'outlet';
  inletHeadwaterFt: number;
  outletHeadwaterFt?: number;
  note: string;
}

interface Pipe {
  inlet: InletType;
  diameterIn: number;
  manningN: number;
  tailwaterDepthFt?: number;
}

const ft = (v: number) => `${v.toFixed(2)} ft`;

/**
 * The headwater the culvert needs: the larger of inlet and outlet control (FHWA HDS-5, 3rd ed. 2012, chapter 3).
 * Without a length the outlet losses cannot be worked out, and the note says the answer is inlet control only.
 */
export function controllingHeadwater(
  c: Pipe,
  flowCfs: number,
  slopeFtPerFt: number,
  lengthFt: number | undefined,
): ControllingHeadwater {
  const diameterFt = c.diameterIn / 12;
  const inlet = within('culvert', () => inletControlHeadwater({ inlet: c.inlet, diameterFt, flowCfs, slopeFtPerFt }));
  const inletWords = `${inlet.regime} inlet, inlet control ${ft(inlet.headwaterFt)}`;
  if (lengthFt === undefined) {
    return {
      headwaterFt: inlet.headwaterFt,
      hwOverD: inlet.hwOverD,
      control: 'inlet',
      inletHeadwaterFt: inlet.headwaterFt,
      note: `${inletWords}; outlet control needs the pipe length`,
    };
  }
  const outlet = within('culvert', () =>
    outletControlHeadwater({
      inlet: c.inlet,
      diameterFt,
      flowCfs,
      manningN: c.manningN,
      lengthFt,
      slopeFtPerFt,
      tailwaterDepthFt: c.tailwaterDepthFt,
    }),
  );
  const control = outlet.headwaterFt > inlet.headwaterFt ? 'outlet' : 'inlet';
  const tailwater =
    c.tailwaterDepthFt === undefined
      ? 'no tailwater depth given, outlet taken as free'
      : `tailwater ${ft(c.tailwaterDepthFt)}`;
  const note = `${control} control governs: ${inletWords}, outlet control ${ft(outlet.headwaterFt)} (ke ${outlet.entranceLossCoefficient}, ${tailwater})`;
  const headwaterFt = Math.max(inlet.headwaterFt, outlet.headwaterFt);
  return {
    headwaterFt,
    hwOverD: headwaterFt / diameterFt,
    control,
    inletHeadwaterFt: inlet.headwaterFt,
    outletHeadwaterFt: outlet.headwaterFt,
    note,
  };
}
