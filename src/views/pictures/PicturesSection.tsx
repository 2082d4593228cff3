/** "Pictures" on the side page: every view as SVG or PNG in one place (the same as each panel's Picture menu). */
import { downloadPicture } from './PictureMenu.tsx';
import { PICTURE_VIEW_ORDER, PICTURE_VIEWS } from './views.ts';
import './pictures.css';

export function PicturesSection() {
  return (
    <section className="pw-side-section pw-files" aria-labelledby="pw-files-pictures">
      <h2 id="pw-files-pictures">Pictures</h2>
      <p className="pw-hint pw-block">
        Each view with its axes and a title line (design name, sample rate), on white, ready for a report.
        Each panel’s “Picture” menu does the same.
      </p>
      <div className="pw-pictures-grid">
        {PICTURE_VIEW_ORDER.map((v) => (
          <div key={v} role="group" aria-label={PICTURE_VIEWS[v].label} className="pw-pictures-row">
            <span>{PICTURE_VIEWS[v].label}</span>
            <button
              type="button"
              onClick={() => void downloadPicture(v, 'svg')}
              aria-label={`${PICTURE_VIEWS[v].label} as SVG`}
            >
              SVG
            </button>
            <button
              type="button"
              onClick={() => void downloadPicture(v, 'png')}
              aria-label={`${PICTURE_VIEWS[v].label} as PNG`}
            >
              PNG
            </button>
          </div>
        ))}
      </div>
    </section>
  );
}
