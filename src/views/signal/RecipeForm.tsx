/** Making a test signal: a preset or parts of one's own (tones, hum, step, impulses, noise), summed, at the design's rate. */
import { useId, useState } from 'react';
import { useWorkbench } from '../../store/useWorkbench.ts';
import { formatHz } from '../shared/format.ts';
import { showGenerated } from './loader.ts';
import {
  PART_KINDS,
  PRESETS,
  newPart,
  recipeSignal,
  type PartKind,
  type Recipe,
  type RecipeError,
  type RecipePart,
} from './recipe.ts';

export function RecipeForm() {
  const fs = useWorkbench((s) => s.design.sampleRate);
  const [recipe, setRecipe] = useState<Recipe>(PRESETS[0]!.recipe);
  const [error, setError] = useState<RecipeError | null>(null);
  const id = useId();
  const setPart = (i: number, part: RecipePart | null) => {
    const parts = recipe.parts.slice();
    if (part) parts[i] = part;
    else parts.splice(i, 1);
    setRecipe({ ...recipe, parts });
    setError(null);
  };
  const make = () => {
    const r = recipeSignal(recipe, fs);
    if (!r.ok) return setError(r.error);
    setError(null);
    showGenerated(r.value);
  };
  return (
    <div className="pw-recipe">
      <label className="pw-recipe-row">
        Start from{' '}
        <select
          aria-label="Ready-made signal"
          value=""
          onChange={(e) => {
            const p = PRESETS.find((x) => x.id === e.target.value);
            if (p) setRecipe(p.recipe);
            setError(null);
          }}
        >
          <option value="">a ready-made signal…</option>
          {PRESETS.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      <ol className="pw-recipe-parts" aria-label="Parts of the signal, summed">
        {recipe.parts.map((part, i) => (
          <PartRow
            key={i}
            index={i}
            part={part}
            error={error?.part === i ? error : null}
            onChange={(p) => setPart(i, p)}
          />
        ))}
      </ol>
      <div className="pw-recipe-row">
        <select
          aria-label="Kind of part to add"
          value=""
          onChange={(e) => {
            if (!e.target.value) return;
            setRecipe({ ...recipe, parts: [...recipe.parts, newPart(e.target.value as PartKind)] });
          }}
        >
          <option value="">Add a part…</option>
          {PART_KINDS.map((k) => (
            <option key={k.kind} value={k.kind}>
              {k.label}
            </option>
          ))}
        </select>
      </div>
      <div className="pw-recipe-row">
        <label htmlFor={`${id}-dur`}>Duration</label>
        <input
          id={`${id}-dur`}
          size={6}
          inputMode="decimal"
          value={recipe.duration}
          aria-invalid={error?.part === -1}
          onChange={(e) => setRecipe({ ...recipe, duration: e.target.value })}
          onKeyDown={(e) => e.key === 'Enter' && make()}
        />
        s at {formatHz(fs)} (the design&apos;s rate)
        <button type="button" className="pw-primary" onClick={make}>
          Make
        </button>
      </div>
      {error?.part === -1 ? (
        <p className="pw-field-error" role="alert">
          {error.message}
        </p>
      ) : null}
    </div>
  );
}

function PartRow(props: {
  index: number;
  part: RecipePart;
  error: RecipeError | null;
  onChange: (p: RecipePart | null) => void;
}) {
  const { index, part, error, onChange } = props;
  const kind = PART_KINDS.find((k) => k.kind === part.kind)!;
  const id = useId();
  return (
    <li className="pw-recipe-part">
      <span className="pw-recipe-kind">{kind.label}</span>
      {kind.fields.map((f) => (
        <label key={f.key} className={f.list ? 'pw-recipe-field pw-recipe-field-list' : 'pw-recipe-field'}>
          {f.label}
          <input
            id={`${id}-${f.key}`}
            size={f.list ? 14 : 5}
            value={part.fields[f.key] ?? ''}
            aria-invalid={error?.field === f.key}
            aria-label={`Part ${index + 1}, ${kind.label}: ${f.label}${f.unit ? ` (${f.unit})` : ''}`}
            onChange={(e) => onChange({ ...part, fields: { ...part.fields, [f.key]: e.target.value } })}
          />
          {f.unit}
        </label>
      ))}
      <button
        type="button"
        className="pw-recipe-remove"
        aria-label={`Remove part ${index + 1} (${kind.label})`}
        onClick={() => onChange(null)}
      >
        ×
      </button>
      {error ? (
        <p className="pw-field-error pw-recipe-error" role="alert">
          {error.message}
        </p>
      ) : null}
    </li>
  );
}
