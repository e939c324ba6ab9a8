import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { chartData, type TrendRow } from '../utils/trendRows';

export interface TagTrendChartProps {
  tags: string[];
  rows: TrendRow[];
  label: string;
}

// Colour plus dash pattern, so lines stay apart in greyscale print and for colour-blind readers.
const strokes = ['var(--blue-10)', 'var(--orange-10)', 'var(--teal-10)', 'var(--purple-10)', 'var(--crimson-10)', 'var(--gray-12)'];
const dashes = ['', '6 3', '2 3', '10 4 2 4', '4 4', '1 2'];

/** Accuracy by tag over time; the table beneath carries the same numbers for everyone. */
export function TagTrendChart({ tags, rows, label }: TagTrendChartProps) {
  const data = chartData(rows);
  return (
    <div role="img" aria-label={label} style={{ width: '100%', height: 320 }}>
      <ResponsiveContainer width="100%" height="100%" initialDimension={{ width: 640, height: 320 }}>
        <LineChart data={data} margin={{ top: 8, right: 16, bottom: 8, left: 0 }}>
          <CartesianGrid strokeDasharray="3 3" />
          <XAxis dataKey="label" />
          <YAxis domain={[0, 100]} unit="%" />
          <Tooltip formatter={(v) => `${String(v)}%`} />
          <Legend />
          {tags.map((tag, i) => (
            <Line
              key={tag}
              type="monotone"
              dataKey={tag}
              name={tag}
              stroke={strokes[i % strokes.length]}
              strokeDasharray={dashes[i % dashes.length]}
              strokeWidth={2}
              connectNulls
              isAnimationActive={false}
            />
          ))}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
