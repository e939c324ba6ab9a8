import { NOT_ENOUGH_DATA, type DebriefSummaryDto, type FigureDto } from '@covalent/shared-types';
import { Card, DataList, Text } from '@radix-ui/themes';
import { formatCoefficient, formatShare } from '../utils/formatFigure';
import { formatDateTime } from '../utils/formatDate';

export interface DebriefSummaryProps {
  summary: DebriefSummaryDto;
}

const methodLabel = { kr20: 'KR-20', alpha: "Cronbach's alpha" } as const;

/** A figure with its reason spelled out: the summary is read (and printed), not hovered. */
function FigureWithReason({ figure, format }: { figure: FigureDto; format: (v: number) => string }) {
  if (figure.value !== null) return <>{format(figure.value)}</>;
  return (
    <span>
      {NOT_ENOUGH_DATA}{' '}
      <Text color="gray" size="2">
        ({figure.reason})
      </Text>
    </span>
  );
}

/** The session's headline figures. */
export function DebriefSummary({ summary: s }: DebriefSummaryProps) {
  return (
    <Card size="3">
      <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
        <DataList.Item>
          <DataList.Label>Class</DataList.Label>
          <DataList.Value>{s.className ?? 'Ad-hoc group'}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Played at</DataList.Label>
          <DataList.Value>{formatDateTime(s.playedAt)}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Format</DataList.Label>
          <DataList.Value>{s.format}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Players</DataList.Label>
          <DataList.Value>
            {s.playerCount}
            {s.removedCount > 0 && ` (${s.removedCount} removed, in no figure)`}
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Items played</DataList.Label>
          <DataList.Value>{s.itemCount}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Class accuracy</DataList.Label>
          <DataList.Value>
            <FigureWithReason figure={s.classAccuracy} format={formatShare} />
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Reliability ({methodLabel[s.reliability.method]})</DataList.Label>
          <DataList.Value>
            <FigureWithReason figure={s.reliability.value} format={formatCoefficient} />
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Standard error of measurement</DataList.Label>
          <DataList.Value>
            <FigureWithReason figure={s.reliability.sem} format={(v) => v.toFixed(2)} />
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Items to revisit</DataList.Label>
          <DataList.Value>{s.revisitCount}</DataList.Value>
        </DataList.Item>
      </DataList.Root>
      {s.unit === 'team' && (
        <Text as="p" size="2" color="gray" mt="3">
          In this format only the called member answers, so each team submission is one unit of the analysis.
        </Text>
      )}
    </Card>
  );
}
