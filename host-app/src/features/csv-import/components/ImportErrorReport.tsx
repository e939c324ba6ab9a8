import type { ApiError } from '@covalent/shared-types';
import { Callout, Flex, Text } from '@radix-ui/themes';
import { importProblems } from '../utils/importProblems';

export interface ImportErrorReportProps {
  error: ApiError;
}

/** Why a CSV import was refused: the server's sentence, then one line per cell to fix. */
export function ImportErrorReport({ error }: ImportErrorReportProps) {
  const problems = importProblems(error);
  return (
    <Callout.Root color="red" variant="surface" role="alert">
      <Flex direction="column" gap="2">
        <Callout.Text weight="bold">{error.message}</Callout.Text>
        {problems.length > 0 && (
          <ul aria-label="Problems in the file" className="import-problems">
            {problems.map((p, i) => (
              <li key={i}>
                <Text weight="bold">{p.where}:</Text> {p.message}
              </li>
            ))}
          </ul>
        )}
        <Text size="2">Nothing was imported. Fix the file and choose it again.</Text>
      </Flex>
    </Callout.Root>
  );
}
