/** A button that opens the file picker for a recording (WAV or CSV/TSV). */
import { useRef } from 'react';
import { loadFile } from './loader.ts';

/** What the picker offers. */
export const RECORDING_ACCEPT = '.wav,.wave,.csv,.tsv,.txt,.dat,audio/wav,audio/x-wav,text/csv,text/plain';

export function OpenFileButton({ label = 'Open a recording…' }: { label?: string }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <button type="button" className="pw-small-button" onClick={() => input.current?.click()}>
        {label}
      </button>
      <input
        ref={input}
        type="file"
        hidden
        accept={RECORDING_ACCEPT}
        aria-label="Recording file (WAV or CSV)"
        data-testid="recording-file-input"
        onChange={(e) => {
          const file = e.target.files?.[0];
          if (file) loadFile(file);
          e.target.value = '';
        }}
      />
    </>
  );
}
