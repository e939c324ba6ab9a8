import type { StudentHistoryDto } from '@covalent/shared-types';
import { Card, DataList, Text } from '@radix-ui/themes';
import { FigureText } from '@/features/debrief/components/FigureText';
import { formatPercentValue } from '@/features/debrief/utils/formatPercentValue';

export interface HistorySummaryProps {
  history: StudentHistoryDto;
}

/** The headline: mean percent over the sessions, and how much there is below. */
export function HistorySummary({ history: h }: HistorySummaryProps) {
  return (
    <Card size="3">
      <DataList.Root orientation={{ initial: 'vertical', sm: 'horizontal' }}>
        <DataList.Item>
          <DataList.Label>Mean percent</DataList.Label>
          <DataList.Value>
            <FigureText figure={h.meanPercent} format={formatPercentValue} />
            {h.meanPercent.value === null && (
              // The value is a flex box, where a leading space collapses: a margin keeps them apart.
              <Text color="gray" size="2" ml="1">
                ({h.meanPercent.reason})
              </Text>
            )}
          </DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Sessions</DataList.Label>
          <DataList.Value>{h.sessions.length}</DataList.Value>
        </DataList.Item>
        <DataList.Item>
          <DataList.Label>Catch-ups</DataList.Label>
          <DataList.Value>{h.catchups.length}</DataList.Value>
        </DataList.Item>
      </DataList.Root>
    </Card>
  );
}
