import { Field, Input, makeStyles, Select, tokens } from '@fluentui/react-components';
import { Search20Regular } from '@fluentui/react-icons';
import { isRole, ROLE_LABELS, ROLES, type Role, type UserStatus } from '@tallyloom/core';
import { useEffect, useRef, useState } from 'react';
import { useDebouncedValue } from '@/hooks/use-debounced-value';
import { isUserStatus, USER_STATUS_LABELS, USER_STATUSES } from './labels';

const searchDelayMs = 300;

const useStyles = makeStyles({
  root: {
    display: 'flex',
    flexWrap: 'wrap',
    alignItems: 'flex-end',
    gap: tokens.spacingHorizontalM,
    marginBottom: tokens.spacingVerticalM,
  },
  search: { minWidth: '260px' },
  select: { minWidth: '200px' },
});

export interface PeopleFilterValues {
  search: string;
  role: Role | undefined;
  status: UserStatus | undefined;
}

export interface PeopleFiltersProps {
  values: PeopleFilterValues;
  onChange: (values: PeopleFilterValues) => void;
}

/** Search by name or e-mail (sent once typing pauses), and narrow by role and status. */
export function PeopleFilters({ values, onChange }: PeopleFiltersProps) {
  const styles = useStyles();
  const [search, setSearch] = useState(values.search);
  const settledSearch = useDebouncedValue(search, searchDelayMs);
  // What this box last sent, to tell its own echo from a change made elsewhere (e.g. "Clear").
  const sent = useRef(values.search);

  useEffect(() => {
    if (settledSearch === sent.current) return;
    sent.current = settledSearch;
    onChange({ ...values, search: settledSearch });
  }, [settledSearch, values, onChange]);

  useEffect(() => {
    if (values.search === sent.current) return;
    sent.current = values.search;
    setSearch(values.search);
  }, [values.search]);

  return (
    <div className={styles.root} role="search" aria-label="Find people">
      <Field label="Search" className={styles.search}>
        <Input
          type="search"
          contentBefore={<Search20Regular aria-hidden="true" />}
          placeholder="Name or e-mail"
          value={search}
          onChange={(_event, data) => setSearch(data.value)}
        />
      </Field>
      <Field label="Role" className={styles.select}>
        <Select
          value={values.role ?? ''}
          onChange={(_event, data) =>
            onChange({ ...values, role: isRole(data.value) ? data.value : undefined })
          }
        >
          <option value="">All roles</option>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Status" className={styles.select}>
        <Select
          value={values.status ?? ''}
          onChange={(_event, data) =>
            onChange({ ...values, status: isUserStatus(data.value) ? data.value : undefined })
          }
        >
          <option value="">All statuses</option>
          {USER_STATUSES.map((status) => (
            <option key={status} value={status}>
              {USER_STATUS_LABELS[status]}
            </option>
          ))}
        </Select>
      </Field>
    </div>
  );
}
