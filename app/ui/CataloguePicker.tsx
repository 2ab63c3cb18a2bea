/**
 * The tool rail's catalogue of rolled sections: pick a series (IPE, HE A, HE B, W) and a size,
 * then place it at the middle of the view (app/ops/catalogue.ts). Each series names its standard;
 * the sizes are nominal dimensions recalled from the published tables (see src/catalogue/).
 */
import { useState } from 'react';
import { catalogueSeries } from '../../src';
import { useEditor } from '../context';

export function CataloguePicker() {
  const editor = useEditor();
  const all = catalogueSeries();
  const [seriesId, setSeriesId] = useState(all[0].id);
  const series = all.find((s) => s.id === seriesId) ?? all[0];
  const [size, setSize] = useState(series.sizes[Math.floor(series.sizes.length / 2)].designation);
  const current = series.sizes.some((z) => z.designation === size) ? size : series.sizes[0].designation;
  return (
    <div className="rail-group catalogue" data-testid="catalogue">
      <h3>Rolled sections</h3>
      <select
        aria-label="Series"
        data-testid="catalogue-series"
        value={series.id}
        title={`${series.name}: ${series.standard}. ${series.source}`}
        onChange={(e) => {
          const next = all.find((s) => s.id === e.target.value) ?? all[0];
          setSeriesId(next.id);
          setSize(next.sizes[Math.floor(next.sizes.length / 2)].designation);
        }}
      >
        {all.map((s) => (
          <option key={s.id} value={s.id} title={s.name}>
            {s.id === 'HEA' ? 'HE A' : s.id === 'HEB' ? 'HE B' : s.id}
          </option>
        ))}
      </select>
      <select aria-label="Size" data-testid="catalogue-size" value={current} onChange={(e) => setSize(e.target.value)}>
        {series.sizes.map((z) => (
          <option key={z.designation} value={z.designation}>
            {z.designation}
          </option>
        ))}
      </select>
      <button
        className="btn"
        data-testid="catalogue-place"
        title={`Place ${current} at the middle of the view (${series.standard})`}
        onClick={() => editor.run('catalogue.place', { series: series.id, designation: current })}
      >
        Place {current}
      </button>
    </div>
  );
}
