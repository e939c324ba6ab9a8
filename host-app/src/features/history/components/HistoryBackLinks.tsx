import { Button, Flex } from '@radix-ui/themes';
import { Link } from 'react-router-dom';
import { routes } from '@/routes';

export interface HistoryBackLinksProps {
  classId: string;
}

/** Ways back to the class; left off the printout. */
export function HistoryBackLinks({ classId }: HistoryBackLinksProps) {
  return (
    <Flex gap="3" wrap="wrap" className="debrief-no-print">
      <Button asChild variant="ghost" color="gray">
        <Link to={routes.classDetail.build(classId)}>Back to the class</Link>
      </Button>
      <Button asChild variant="ghost" color="gray">
        <Link to={routes.classTrends.build(classId)}>Class trends</Link>
      </Button>
    </Flex>
  );
}
