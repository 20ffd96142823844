import { useState } from 'react';
import { SOIL_TEXTURES, greenAmptForTexture, attempt, methodValue, type SoilTextureName } from '../../core';
import { useActions, useScenario } from '../../store';
import { NumberField } from '../fields/NumberField';

const DEFAULT_TEXTURE: SoilTextureName = 'loam';

/**
 * Green–Ampt values from a soil texture (the core's table of Rawls,
 * Brakensiek & Miller 1983) and the soil's initial effective saturation:
 * one click sets K, ψ and Δθ together, with Sᵢ and λ for recovery in dry
 * spells, as one undoable edit. The recovery switch stays as it was. Shown
 * for a method whose spec says `soilPresets`.
 */
export function SoilPresets() {
  const actions = useActions();
  const recovers = useScenario((s) => {
    const v = methodValue(s.method, 'recovers');
    return typeof v === 'boolean' ? v : undefined;
  });
  const [texture, setTexture] = useState<SoilTextureName>(DEFAULT_TEXTURE);
  const [saturation, setSaturation] = useState(0.3);
  const [problem, setProblem] = useState<string | null>(null);
  return (
    <fieldset className="presets" aria-describedby="soil-preset-msg">
      <legend>Soil texture values</legend>
      <div className="field">
        <label htmlFor="soil-texture">Soil texture</label>
        <select
          id="soil-texture"
          value={texture}
          onChange={(e) => {
            const picked = SOIL_TEXTURES.find((t) => t.name === e.currentTarget.value);
            if (picked) setTexture(picked.name);
          }}
        >
          {SOIL_TEXTURES.map((t) => (
            <option key={t.name} value={t.name}>
              {t.name}
            </option>
          ))}
        </select>
      </div>
      <NumberField
        id="soil-saturation"
        label="Initial effective saturation"
        value={saturation}
        check={(v) =>
          v < 0 || v > 1 ? 'Initial effective saturation must be between 0 (dry) and 1 (saturated).' : null
        }
        onCommit={setSaturation}
        hint="0 as dry as the soil gets, 1 saturated."
      />
      <button
        type="button"
        onClick={() => {
          const r = attempt(() => {
            const soil = greenAmptForTexture(texture, saturation);
            actions.setMethod(recovers === undefined ? soil : { ...soil, recovers }, `Use ${texture} soil values`);
          });
          setProblem(r.ok ? null : r.error.message);
        }}
      >
        Use soil values
      </button>
      <p className="field__msg" id="soil-preset-msg" aria-live="polite">
        {problem}
      </p>
    </fieldset>
  );
}
