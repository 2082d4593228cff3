/** "Design file": save the design as a JSON file, open one by picker (or by dropping it on the page). */
import { useRef, useState } from 'react';
import { useWorkbench } from '../../../store/useWorkbench.ts';
import { designFileName } from '../../shared/fileName.ts';
import { currentShared, openShared } from './openShared.ts';
import { readDesignBlob } from './readFile.ts';
import { downloadDesignFile } from './saveDesign.ts';

type Outcome = { tone: 'error' | 'info'; text: string } | null;

export function FileSection() {
  const name = useWorkbench((s) => s.design.name);
  const picker = useRef<HTMLInputElement>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);

  const save = () => {
    const file = downloadDesignFile(currentShared());
    setOutcome({ tone: 'info', text: `Saved as ${file}.` });
  };
  const open = async (files: FileList | null) => {
    const file = files?.[0];
    if (!file) return;
    const r = await readDesignBlob(file);
    if (!r.ok) {
      setOutcome({ tone: 'error', text: `${r.message} Your design is unchanged.` });
      return;
    }
    const changed = openShared(r.value);
    setOutcome({
      tone: 'info',
      text: changed
        ? `Opened “${r.value.design.name || file.name}”. Undo brings back the design you had.`
        : `“${file.name}” holds the design already open.`,
    });
  };
  return (
    <section className="pw-side-section pw-files" aria-labelledby="pw-files-file">
      <h2 id="pw-files-file">Design file</h2>
      <div className="pw-files-row">
        <button type="button" onClick={save} title={`Download ${designFileName(name)}`}>
          Save file
        </button>
        <button type="button" onClick={() => picker.current?.click()}>
          Open file…
        </button>
        <input
          ref={picker}
          type="file"
          accept=".json,application/json"
          hidden
          aria-label="Design file to open"
          data-testid="open-file-input"
          onChange={(e) => {
            void open(e.currentTarget.files);
            e.currentTarget.value = '';
          }}
        />
      </div>
      <p className="pw-hint pw-block">
        Or drop a design file anywhere on the page. Files keep every number exactly and open in any later
        version of Polewright.
      </p>
      {outcome ? (
        <p
          className={outcome.tone === 'error' ? 'pw-field-error' : 'pw-files-status'}
          role={outcome.tone === 'error' ? 'alert' : 'status'}
          data-testid="file-outcome"
        >
          {outcome.text}
        </p>
      ) : null}
    </section>
  );
}
