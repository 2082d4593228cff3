/** The cascade as a table: per section its coefficients (values or stored codes), peak gain, pole radius, scale. */
import { qName, type Implementation } from '../../../core/fixed/index.ts';
import { formatDb, formatNumber } from '../../shared/format.ts';

/** Significant digits of a coefficient in the table (the exports carry all 17). */
const COEF_DIGITS = 6;

interface Props {
  impl: Implementation;
  show: 'float' | 'codes';
}

/** A peak gain to 0.01 dB: the scaled sections sit at 0 dB up to rounding, which should read as 0. */
function peakText(db: number): string {
  return formatDb(Math.round(db * 100) / 100);
}

function Coefs({ name, values }: { name: string; values: readonly (number | string)[] }) {
  return (
    <span className="pw-coef-line">
      <span className="pw-coef-name">{name}</span>
      {values.map((v, i) => (
        <span key={i} className="pw-coef">
          {typeof v === 'number' ? formatNumber(v, COEF_DIGITS) : v}
        </span>
      ))}
    </span>
  );
}

export function SectionsTable({ impl, show }: Props) {
  const negated = impl.settings.feedbackSign === 'negated';
  const q = impl.quantized.format;
  return (
    <div className="pw-table-wrap">
      <table className="pw-sections-table" data-testid="sections-table">
        <caption className="pw-visually-hidden">
          Second-order sections in the order they run
          {show === 'codes' ? `, coefficients as ${q.wordLength}-bit codes in ${qName(q)}` : ''}
        </caption>
        <thead>
          <tr>
            <th scope="col">#</th>
            <th scope="col">
              {show === 'float' ? 'coefficients' : `codes, ${qName(q)}${negated ? ', −a stored' : ''}`}
            </th>
            <th
              scope="col"
              title="Peak of this section's own magnitude response after scaling, and its largest pole radius"
            >
              peak, r
            </th>
            <th scope="col" title="Factor the scaling multiplied into this section's numerator">
              scale
            </th>
          </tr>
        </thead>
        <tbody>
          {impl.cascade.sections.map((sec, i) => {
            const c = sec.coefficients;
            const codes = impl.quantized.codes[i]!;
            return (
              <tr key={i}>
                <th scope="row">{i + 1}</th>
                <td className="pw-coefs">
                  {show === 'float' ? (
                    <>
                      <Coefs name="b" values={[c[0], c[1], c[2]]} />
                      <Coefs name="a" values={[1, c[4], c[5]]} />
                    </>
                  ) : (
                    <>
                      <Coefs name="b" values={codes.b.map(String)} />
                      <Coefs name={negated ? '−a' : 'a'} values={['·', ...codes.a.map(String)]} />
                    </>
                  )}
                </td>
                <td className="pw-sec-num">
                  <span className="pw-block">{peakText(sec.peakGainDb)}</span>
                  <span className="pw-block pw-sub">
                    {sec.poles.length ? `r ${formatNumber(sec.poleRadius, 6)}` : 'no poles'}
                  </span>
                </td>
                <td className="pw-sec-num">{formatNumber(sec.scale, 4)}</td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
