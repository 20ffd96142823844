import { InputError } from '../errors';
import { depthFromVolumeMm } from '../units';
import { validateHydrograph } from './hydrograph';
import { byKind } from '../kind-table';
import { validateBaseflowMethod } from './methods';
import { findPeakIndex } from './peak';
import { BASEFLOW_SEPARATORS } from './separators';
import type { BaseflowMethod, BaseflowOptions, BaseflowResult, Hydrograph } from './types';
import { recordVolumeM3, volumeAboveLineM3 } from './volume';

/**
 * Separates baseflow from a streamflow record. Validates the record, the
 * method and the area at the edge (InputError naming the field and, for a
 * sample, its index), runs the method, then sums the volumes: direct runoff
 * ∫ (Q − Q_b)⁺ dt by the trapezoidal rule over the method's window, with exact
 * crossings where Q dips below the line; total ∫ Q dt over the record;
 * baseflow = total − direct.
 */
export function separateBaseflow(
  hydrograph: Hydrograph,
  method: BaseflowMethod,
  options: BaseflowOptions = {},
): BaseflowResult {
  validateHydrograph(hydrograph);
  validateBaseflowMethod(method);
  const areaM2 = checkedArea(options.areaM2);
  const { timesH, dischargeM3s } = hydrograph;
  const n = dischargeM3s.length;
  const peakIndex = findPeakIndex(dischargeM3s);
  const { lineM3s, startIndex, endTimeH, endLineM3s, notice } = byKind(BASEFLOW_SEPARATORS, method, (separate, m) =>
    separate(timesH, dischargeM3s, m, { peakIndex, areaM2 }),
  );

  const baseflowM3s = new Float64Array(n);
  const directM3s = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const q = dischargeM3s[k] as number;
    const inside = k >= startIndex && (timesH[k] as number) <= endTimeH;
    const line = lineM3s[k] as number;
    const b = inside && line < q ? (line > 0 ? line : 0) : q;
    baseflowM3s[k] = b;
    directM3s[k] = q - b;
  }

  const directVolumeM3 = volumeAboveLineM3(timesH, dischargeM3s, lineM3s, startIndex, endTimeH, endLineM3s);
  const totalVolumeM3 = recordVolumeM3(timesH, dischargeM3s);
  const baseflowVolumeM3 = Math.max(0, totalVolumeM3 - directVolumeM3);
  return {
    baseflowM3s,
    directM3s,
    directVolumeM3,
    baseflowVolumeM3,
    totalVolumeM3,
    directDepthMm: areaM2 === undefined ? undefined : depthFromVolumeMm(directVolumeM3, areaM2),
    baseflowIndex: totalVolumeM3 > 0 ? baseflowVolumeM3 / totalVolumeM3 : 0,
    peakM3s: dischargeM3s[peakIndex] as number,
    peakTimeH: timesH[peakIndex] as number,
    peakIndex,
    riseIndex: startIndex,
    endTimeH,
    ...(notice === undefined ? {} : { notice }),
  };
}

/** The area in m², or undefined when not known (absent or 0, as the scenario stores it). */
function checkedArea(areaM2: number | undefined): number | undefined {
  if (areaM2 === undefined || areaM2 === 0) return undefined;
  if (typeof areaM2 !== 'number' || !Number.isFinite(areaM2) || areaM2 < 0) {
    throw new InputError(
      'areaM2',
      `The catchment area must be a finite number of m², greater than zero (or 0 when not known) (got ${String(areaM2)}).`,
    );
  }
  return areaM2;
}
