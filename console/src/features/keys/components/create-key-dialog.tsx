import { PlusIcon } from '@radix-ui/react-icons';
import { Button, Checkbox, Dialog, Flex, Select, Text, TextField } from '@radix-ui/themes';
import { useState, type FormEvent } from 'react';
import { FormField } from '@/components/form-field';
import { ProblemCallout } from '@/components/problem-callout';
import { ApiProblem } from '@/lib/problem';
import { useCreateApiKey } from '@/features/keys/api/create-api-key';
import { KeySecretReveal } from '@/features/keys/components/key-secret-reveal';
import { keyScopes, type ApiKeyScope } from '@/features/keys/components/key-scopes';

const expiryChoices = [
  { value: 'never', label: 'No expiry' },
  { value: '30', label: 'In 30 days' },
  { value: '90', label: 'In 90 days' },
  { value: '365', label: 'In one year' },
  { value: 'date', label: 'On a chosen date' },
] as const;
type ExpiryChoice = (typeof expiryChoices)[number]['value'];

const dayMs = 24 * 60 * 60 * 1000;

/** The expiry to send, or an error message for the date field. A chosen date ends at its last minute, local time. */
export function expiryFor(choice: ExpiryChoice, chosenDate: string, now = Date.now()): { expiresAt?: string; error?: string } {
  if (choice === 'never') return {};
  if (choice !== 'date') return { expiresAt: new Date(now + Number(choice) * dayMs).toISOString() };
  if (!/^\d{4}-\d{2}-\d{2}$/.test(chosenDate)) return { error: 'Choose a date.' };
  const endOfDay = new Date(`${chosenDate}T23:59:00`);
  if (Number.isNaN(endOfDay.getTime()) || endOfDay.getTime() <= now) return { error: 'Choose a date in the future.' };
  return { expiresAt: endOfDay.toISOString() };
}

export function CreateKeyDialog({ teamId }: { teamId: string }) {
  const createKey = useCreateApiKey(teamId);
  const [open, setOpen] = useState(false);
  const [name, setName] = useState('');
  const [scopes, setScopes] = useState<ApiKeyScope[]>(['fits:run']);
  const [expiry, setExpiry] = useState<ExpiryChoice>('never');
  const [chosenDate, setChosenDate] = useState('');
  const [localErrors, setLocalErrors] = useState<{ scopes?: string; expiresAt?: string }>({});
  const problem = createKey.error instanceof ApiProblem ? createKey.error : null;

  function reset() {
    createKey.reset();
    setName('');
    setScopes(['fits:run']);
    setExpiry('never');
    setChosenDate('');
    setLocalErrors({});
  }

  function handleOpenChange(next: boolean) {
    setOpen(next);
    // Closing forgets the full key: it lived only in this dialog's state.
    if (!next) reset();
  }

  function toggleScope(scope: ApiKeyScope, checked: boolean) {
    setScopes((current) => (checked ? [...current, scope] : current.filter((entry) => entry !== scope)));
  }

  function handleSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const { expiresAt, error } = expiryFor(expiry, chosenDate);
    const errors = {
      scopes: scopes.length === 0 ? 'Choose at least one scope.' : undefined,
      expiresAt: error,
    };
    setLocalErrors(errors);
    if (errors.scopes || errors.expiresAt) return;
    const ordered = keyScopes.map((entry) => entry.scope).filter((scope) => scopes.includes(scope));
    createKey.mutate({ name: name.trim(), scopes: ordered, ...(expiresAt ? { expiresAt } : {}) });
  }

  const created = createKey.data;

  return (
    <Dialog.Root open={open} onOpenChange={handleOpenChange}>
      <Dialog.Trigger>
        <Button>
          <PlusIcon aria-hidden="true" /> Create key
        </Button>
      </Dialog.Trigger>
      <Dialog.Content maxWidth="560px" aria-describedby={undefined}>
        {created ? (
          <Flex direction="column" gap="4">
            <Dialog.Title mb="0">Key created</Dialog.Title>
            <KeySecretReveal plaintextKey={created.plaintextKey} keyName={created.apiKey.name} />
            <Flex justify="end">
              <Dialog.Close>
                <Button>I have stored the key</Button>
              </Dialog.Close>
            </Flex>
          </Flex>
        ) : (
          <form onSubmit={handleSubmit} noValidate>
            <Flex direction="column" gap="4">
              <Dialog.Title mb="0">Create an API key</Dialog.Title>
              <FormField
                id="key-name"
                label="Name"
                hint="Say which service or job uses it, e.g. settlement-forecast job."
                error={problem?.fieldError('name')}
              >
                {(control) => (
                  <TextField.Root {...control} required maxLength={100} value={name} onChange={(event) => setName(event.target.value)} />
                )}
              </FormField>

              <fieldset className="ll-fieldset" aria-describedby={localErrors.scopes || problem?.fieldError('scopes') ? 'key-scopes-error' : undefined}>
                <legend>
                  <Text size="2" weight="medium">
                    Scopes
                  </Text>
                </legend>
                <Flex direction="column" gap="2">
                  {keyScopes.map((entry) => (
                    <Text as="label" size="2" key={entry.scope}>
                      <Flex gap="2" align="start">
                        <Checkbox
                          checked={scopes.includes(entry.scope)}
                          onCheckedChange={(checked) => toggleScope(entry.scope, checked === true)}
                        />
                        <span>
                          {entry.label} <code className="ll-scope-code">{entry.scope}</code>
                          <Text as="span" color="gray" size="1" className="ll-block">
                            {entry.description}
                          </Text>
                        </span>
                      </Flex>
                    </Text>
                  ))}
                </Flex>
                {localErrors.scopes || problem?.fieldError('scopes') ? (
                  <Text id="key-scopes-error" size="1" color="red" className="ll-field-error">
                    {localErrors.scopes ?? problem?.fieldError('scopes')}
                  </Text>
                ) : null}
              </fieldset>

              <Flex direction="column" gap="2">
                <FormField id="key-expiry" label="Expiry">
                  {(control) => (
                    <Select.Root value={expiry} onValueChange={(value) => setExpiry(value as ExpiryChoice)}>
                      <Select.Trigger {...control} />
                      <Select.Content>
                        {expiryChoices.map((choice) => (
                          <Select.Item key={choice.value} value={choice.value}>
                            {choice.label}
                          </Select.Item>
                        ))}
                      </Select.Content>
                    </Select.Root>
                  )}
                </FormField>
                {expiry === 'date' ? (
                  <FormField
                    id="key-expiry-date"
                    label="Expiry date"
                    hint="The key stops working at the end of this day, at most three years ahead."
                    error={localErrors.expiresAt ?? problem?.fieldError('expiresAt')}
                  >
                    {(control) => (
                      <TextField.Root {...control} type="date" value={chosenDate} onChange={(event) => setChosenDate(event.target.value)} />
                    )}
                  </FormField>
                ) : problem?.fieldError('expiresAt') ? (
                  <Text size="1" color="red" className="ll-field-error">
                    {problem.fieldError('expiresAt')}
                  </Text>
                ) : null}
              </Flex>

              <ProblemCallout error={createKey.error} />

              <Flex gap="3" justify="end">
                <Dialog.Close>
                  <Button type="button" variant="soft" color="gray">
                    Cancel
                  </Button>
                </Dialog.Close>
                <Button type="submit" loading={createKey.isPending}>
                  Create key
                </Button>
              </Flex>
            </Flex>
          </form>
        )}
      </Dialog.Content>
    </Dialog.Root>
  );
}
