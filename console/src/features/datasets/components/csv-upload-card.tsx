import { UploadIcon } from '@radix-ui/react-icons';
import { Badge, Button, Callout, Card, Flex, Heading, Progress, Select, Text, TextField } from '@radix-ui/themes';
import { useId, useRef, useState, type FormEvent } from 'react';
import { ProblemCallout } from '@/components/problem-callout';
import type { components } from '@/lib/api-schema';
import { UploadProblem, useUploadDatasetCsv, type CsvDelimiter } from '@/features/datasets/api/upload-dataset-csv';
import { isValidDatasetName, nameFromFileName } from '@/features/datasets/model/dataset-versions';

type Dataset = components['schemas']['DatasetDto'];

const delimiters: Array<{ value: CsvDelimiter; label: string }> = [
  { value: ',', label: 'Comma ( , )' },
  { value: ';', label: 'Semicolon ( ; )' },
  { value: '\t', label: 'Tab' },
  { value: '|', label: 'Vertical bar ( | )' },
];

/** The rows an upload problem names, at most this many listed before "and n more". */
const listedRows = 12;

function formatBytes(bytes: number): string {
  if (bytes < 1024) return `${bytes} B`;
  if (bytes < 1024 * 1024) return `${(bytes / 1024).toFixed(1)} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

function UploadRefusal({ problem }: { problem: UploadProblem }) {
  const shown = problem.rows.slice(0, listedRows);
  return (
    <Callout.Root color="red" size="1" role="alert">
      <Callout.Text>
        <Flex direction="column" gap="1" as="span">
          <Text as="span" weight="medium">
            {problem.detail}
          </Text>
          {problem.code ? (
            <Text as="span" size="1">
              Reason: <code>{problem.code}</code>
            </Text>
          ) : null}
          {shown.length > 0 ? (
            <Text as="span" size="1">
              Data rows (header not counted): {shown.join(', ')}
              {problem.rows.length > shown.length ? ` and ${problem.rows.length - shown.length} more` : ''}
            </Text>
          ) : null}
          {problem.fieldErrors
            .filter((field) => !field.pointer.startsWith('#/file/rows/'))
            .map((field) => (
              <Text as="span" size="1" key={field.pointer}>
                <code>{field.pointer.replace('#/file/columns/', 'column ')}</code>: {field.detail}
              </Text>
            ))}
        </Flex>
      </Callout.Text>
    </Callout.Root>
  );
}

export function CsvUploadCard({ teamId, onUploaded }: { teamId: string; onUploaded: (dataset: Dataset) => void }) {
  const upload = useUploadDatasetCsv(teamId);
  const [file, setFile] = useState<File | null>(null);
  const [name, setName] = useState('');
  const [delimiter, setDelimiter] = useState<CsvDelimiter>(',');
  const [progress, setProgress] = useState<{ loaded: number; total: number } | null>(null);
  const fileInput = useRef<HTMLInputElement>(null);
  const id = useId();
  const nameInvalid = name !== '' && !isValidDatasetName(name);

  function chooseFile(next: File | null) {
    setFile(next);
    upload.reset();
    setProgress(null);
    if (next) setName(nameFromFileName(next.name));
  }

  function submit(event: FormEvent) {
    event.preventDefault();
    if (!file || !isValidDatasetName(name)) return;
    setProgress({ loaded: 0, total: file.size });
    upload.mutate(
      { file, fileName: file.name, name, delimiter, onProgress: (loaded, total) => setProgress({ loaded, total }) },
      {
        onSuccess: (dataset) => {
          onUploaded(dataset);
          setFile(null);
          setName('');
          if (fileInput.current) fileInput.current.value = '';
        },
      },
    );
  }

  const percent = progress && progress.total > 0 ? Math.min(100, Math.round((progress.loaded / progress.total) * 100)) : 0;

  return (
    <Card size="2" className="ll-panel">
      <form onSubmit={submit} aria-labelledby={`${id}-heading`}>
        <Flex direction="column" gap="3">
          <Flex direction="column" gap="1">
            <Heading as="h2" size="3" weight="medium" id={`${id}-heading`}>
              Upload a CSV file
            </Heading>
            <Text size="2" color="gray">
              The first line names the columns; empty cells are missing values. Uploading under an existing name adds a new version.
            </Text>
          </Flex>
          <Flex gap="3" align="end" wrap="wrap">
            <Flex direction="column" gap="1" className="ll-upload-file">
              <Text as="label" size="2" weight="medium" htmlFor={`${id}-file`}>
                CSV file
              </Text>
              <input
                ref={fileInput}
                id={`${id}-file`}
                type="file"
                accept=".csv,.tsv,.txt,text/csv"
                className="ll-file-input"
                onChange={(event) => chooseFile(event.target.files?.[0] ?? null)}
              />
            </Flex>
            <Flex direction="column" gap="1" className="ll-upload-name">
              <Text as="label" size="2" weight="medium" htmlFor={`${id}-name`}>
                Dataset name
              </Text>
              <TextField.Root
                id={`${id}-name`}
                value={name}
                onChange={(event) => setName(event.target.value)}
                placeholder="e.g. merchant-chargebacks"
                aria-invalid={nameInvalid || undefined}
                aria-describedby={nameInvalid ? `${id}-name-error` : undefined}
              />
            </Flex>
            <Flex direction="column" gap="1">
              <Text as="label" size="2" weight="medium" htmlFor={`${id}-delimiter`}>
                Delimiter
              </Text>
              <Select.Root value={delimiter} onValueChange={(value) => setDelimiter(value as CsvDelimiter)}>
                <Select.Trigger id={`${id}-delimiter`} />
                <Select.Content>
                  {delimiters.map((entry) => (
                    <Select.Item key={entry.label} value={entry.value}>
                      {entry.label}
                    </Select.Item>
                  ))}
                </Select.Content>
              </Select.Root>
            </Flex>
            <Button type="submit" disabled={!file || !isValidDatasetName(name)} loading={upload.isPending}>
              <UploadIcon aria-hidden="true" /> Upload
            </Button>
          </Flex>
          {nameInvalid ? (
            <Text id={`${id}-name-error`} size="1" color="red" className="ll-field-error">
              Use letters, digits, “.”, “_” or “-”, starting with a letter or digit (at most 120 characters).
            </Text>
          ) : null}
          {file ? (
            <Text size="1" color="gray">
              {file.name}, {formatBytes(file.size)}
            </Text>
          ) : null}
          {progress && (upload.isPending || upload.isSuccess) ? (
            <Flex direction="column" gap="1">
              <Progress value={upload.isSuccess ? 100 : percent} aria-label="Upload progress" max={100} />
              <Text size="1" color="gray" role="status">
                {upload.isSuccess
                  ? 'Stored.'
                  : percent < 100
                    ? `Sending… ${percent}% (${formatBytes(progress.loaded)} of ${formatBytes(progress.total)})`
                    : 'Sent; the API is reading and summarising the columns…'}
              </Text>
            </Flex>
          ) : null}
          {upload.isSuccess ? (
            <Flex gap="2" align="center">
              <Badge color="jade" variant="soft">
                Uploaded
              </Badge>
              <Text size="2">
                {upload.data.name}, version {upload.data.version}: {upload.data.rowCount.toLocaleString()} rows,{' '}
                {upload.data.columns.length} columns.
              </Text>
            </Flex>
          ) : null}
          {upload.error instanceof UploadProblem ? <UploadRefusal problem={upload.error} /> : <ProblemCallout error={upload.error} />}
        </Flex>
      </form>
    </Card>
  );
}
