import { InputError } from './errors';
import type { GreenAmptLoss } from './loss/types';

/**
 * Green–Ampt parameters for the 11 USDA soil texture classes (mean values):
 * Rawls, W.J., Brakensiek, D.L. and Miller, N. (1983), Green-Ampt infiltration
 * parameters from soils data, Journal of Hydraulic Engineering 109(1), 62–70;
 * as tabulated in Chow, Maidment & Mays (1988) Applied Hydrology, Table 4.3.1.
 * The published suction head (cm) and conductivity (cm/h) are written here in
 * mm and mm/h (× 10); porosities are volume fractions as printed. A test
 * checks these numbers against a fixture copy of the published table.
 *
 * Each texture also carries the Brooks–Corey pore-size distribution index λ
 * (geometric mean) of Rawls, Brakensiek & Saxton (1982), Estimation of soil
 * water properties, Transactions of the ASAE 25(5), 1316–1320 (values from
 * memory), which the Green–Ampt recovery in dry spells needs. The memory is
 * checked in a test: with the same table's bubbling pressures, the relation
 * ψ = h_b(2 + 3λ)/(2(1 + 3λ)) by which Rawls, Brakensiek & Miller (1983)
 * derived ψ gives back the ψ of the table above within 2 %.
 */
export interface SoilTexture {
  readonly name: SoilTextureName;
  /** Total porosity η. */
  readonly porosity: number;
  /** Effective porosity θ_e (porosity less residual water content). */
  readonly effectivePorosity: number;
  /** Wetting-front suction head ψ, mm. */
  readonly suctionMm: number;
  /** Hydraulic conductivity K, mm/h. */
  readonly ksMmH: number;
  /** Brooks–Corey pore-size distribution index λ (Rawls, Brakensiek & Saxton 1982; from memory). */
  readonly poreSizeIndex: number;
}

export type SoilTextureName =
  | 'sand'
  | 'loamy sand'
  | 'sandy loam'
  | 'loam'
  | 'silt loam'
  | 'sandy clay loam'
  | 'clay loam'
  | 'silty clay loam'
  | 'sandy clay'
  | 'silty clay'
  | 'clay';

const texture = (
  name: SoilTextureName,
  porosity: number,
  effectivePorosity: number,
  suctionMm: number,
  ksMmH: number,
  poreSizeIndex: number,
): SoilTexture => ({ name, porosity, effectivePorosity, suctionMm, ksMmH, poreSizeIndex });

/** The 11 textures, coarse to fine, in the order of the published table. */
export const SOIL_TEXTURES: readonly SoilTexture[] = [
  texture('sand', 0.437, 0.417, 49.5, 117.8, 0.592),
  texture('loamy sand', 0.437, 0.401, 61.3, 29.9, 0.474),
  texture('sandy loam', 0.453, 0.412, 110.1, 10.9, 0.322),
  texture('loam', 0.463, 0.434, 88.9, 3.4, 0.22),
  texture('silt loam', 0.501, 0.486, 166.8, 6.5, 0.211),
  texture('sandy clay loam', 0.398, 0.33, 218.5, 1.5, 0.25),
  texture('clay loam', 0.464, 0.309, 208.8, 1.0, 0.194),
  texture('silty clay loam', 0.471, 0.432, 273.0, 1.0, 0.151),
  texture('sandy clay', 0.43, 0.321, 239.0, 0.6, 0.168),
  texture('silty clay', 0.479, 0.423, 292.2, 0.5, 0.127),
  texture('clay', 0.475, 0.385, 316.3, 0.3, 0.131),
];

export function soilTexture(name: SoilTextureName): SoilTexture {
  const found = SOIL_TEXTURES.find((t) => t.name === name);
  if (!found) {
    const known = SOIL_TEXTURES.map((t) => t.name).join(', ');
    throw new InputError('texture', `Unknown soil texture "${String(name)}"; known textures: ${known}.`);
  }
  return found;
}

/**
 * Moisture deficit Δθ = (1 − S_e)·θ_e from the initial effective saturation
 * S_e (0 = as dry as the soil gets, 1 = saturated) (Chow, Maidment & Mays
 * 1988, §4.3, eq. 4.3.12 — number from memory).
 */
export function moistureDeficitFromSaturation(effectivePorosity: number, initialSaturation: number): number {
  if (typeof effectivePorosity !== 'number' || !(effectivePorosity >= 0 && effectivePorosity <= 1)) {
    throw new InputError(
      'effectivePorosity',
      `Effective porosity must be between 0 and 1 (got ${String(effectivePorosity)}).`,
    );
  }
  if (typeof initialSaturation !== 'number' || !(initialSaturation >= 0 && initialSaturation <= 1)) {
    throw new InputError(
      'initialSaturation',
      `Initial effective saturation must be between 0 and 1 (got ${String(initialSaturation)}).`,
    );
  }
  return (1 - initialSaturation) * effectivePorosity;
}

/**
 * A Green–Ampt method for a soil texture at an initial effective saturation:
 * K, ψ and Δθ, and for recovery in dry spells Sᵢ and the texture's λ. The
 * `recovers` switch is the caller's to keep.
 */
export function greenAmptForTexture(name: SoilTextureName, initialSaturation: number): GreenAmptLoss {
  const soil = soilTexture(name);
  return {
    kind: 'green-ampt',
    ksMmH: soil.ksMmH,
    suctionMm: soil.suctionMm,
    moistureDeficit: moistureDeficitFromSaturation(soil.effectivePorosity, initialSaturation),
    initialSaturation,
    poreSizeIndex: soil.poreSizeIndex,
  };
}
