import type { RosterEntryDto } from '@covalent/shared-types';
import { Badge, Card, Flex, Grid, Heading, Text } from '@radix-ui/themes';
import { groupByTable } from '../utils/groupByTable';
import { timeMultiplierLabel } from '../utils/timeMultiplierOptions';

export interface SeatMapProps {
  roster: RosterEntryDto[];
}

/** The room at a glance: one card per table, seats in order; the Mixer spreads each table across teams. */
export function SeatMap({ roster }: SeatMapProps) {
  const groups = groupByTable(roster);
  if (groups.length === 0) {
    return <Text color="gray">Add students to see the seat map.</Text>;
  }
  return (
    <Grid columns={{ initial: '1', xs: '2', sm: '3' }} gap="3" aria-label="Seat map" role="list">
      {groups.map((group) => {
        const name = group.table === null ? 'No table' : `Table ${group.table}`;
        const headingId = `seat-map-${group.table ?? 'none'}`;
        return (
          <Card key={group.table ?? ''} size="2" role="listitem" aria-labelledby={headingId}>
            <Flex direction="column" gap="3">
              <Flex justify="between" align="baseline">
                <Heading as="h3" size="3" id={headingId}>
                  {name}
                </Heading>
                <Text size="2" color="gray">
                  {group.entries.length} {group.entries.length === 1 ? 'student' : 'students'}
                </Text>
              </Flex>
              <ul className="seat-list" aria-label={`Seats at ${name}`}>
                {group.entries.map((entry) => (
                  <li key={entry.id}>
                    <Flex gap="2" align="center" wrap="wrap">
                      <Text size="2" color="gray" className="seat-number">
                        {entry.seatNumber === null ? 'Seat —' : `Seat ${entry.seatNumber}`}
                      </Text>
                      <Text weight="bold">{entry.displayName}</Text>
                      {entry.timeMultiplier !== 1 && (
                        <Badge variant="soft" color="gray">
                          {timeMultiplierLabel(entry.timeMultiplier)}
                        </Badge>
                      )}
                    </Flex>
                  </li>
                ))}
              </ul>
            </Flex>
          </Card>
        );
      })}
    </Grid>
  );
}
