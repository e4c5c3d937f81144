import { Field, Input, Select } from '@fluentui/react-components';
import { ROLE_LABELS, ROLE_SCOPE, ROLES, isRole, type Role } from '@tallyloom/core';
import { ScopePicker } from './scope-picker';
import type { ScopeOptions } from './scope-options';

/** A person's name, role and scope as a form holds them, before they are sent. */
export interface PersonDraft {
  displayName: string;
  role: Role | '';
  regionId: number | null;
  chapterId: number | null;
}

export type PersonField = 'displayName' | 'role' | 'regionId' | 'chapterId';

export type PersonProblems = Partial<Record<PersonField, string>>;

export function personProblems(draft: PersonDraft): PersonProblems {
  const problems: PersonProblems = {};
  if (!draft.displayName.trim()) problems.displayName = 'Enter the name others will see.';
  if (!draft.role) problems.role = 'Choose a role.';
  else if (ROLE_SCOPE[draft.role] === 'region' && draft.regionId === null) {
    problems.regionId = 'Choose the region they coordinate.';
  } else if (ROLE_SCOPE[draft.role] === 'chapter' && draft.chapterId === null) {
    problems.chapterId = 'Choose the chapter they lead.';
  }
  return problems;
}

/** The draft as the API takes it: only the one scope the role needs, the other cleared. */
export function scopeOfDraft(draft: PersonDraft & { role: Role }) {
  const scope = ROLE_SCOPE[draft.role];
  return {
    regionId: scope === 'region' ? draft.regionId : null,
    chapterId: scope === 'chapter' ? draft.chapterId : null,
  };
}

export interface PersonFieldsProps {
  draft: PersonDraft;
  onChange: (draft: PersonDraft) => void;
  problems: PersonProblems;
  scopeOptions: ScopeOptions;
}

/** Name, role and — when the role is limited to one — the region or chapter. */
export function PersonFields({ draft, onChange, problems, scopeOptions }: PersonFieldsProps) {
  const scope = draft.role ? ROLE_SCOPE[draft.role] : undefined;
  return (
    <>
      <Field label="Display name" validationMessage={problems.displayName}>
        <Input
          name="displayName"
          autoComplete="off"
          value={draft.displayName}
          onChange={(_event, data) => onChange({ ...draft, displayName: data.value })}
        />
      </Field>
      <Field label="Role" validationMessage={problems.role}>
        <Select
          name="role"
          value={draft.role}
          onChange={(_event, data) =>
            onChange({ ...draft, role: isRole(data.value) ? data.value : '' })
          }
        >
          <option value="">Choose a role</option>
          {ROLES.map((role) => (
            <option key={role} value={role}>
              {ROLE_LABELS[role]}
            </option>
          ))}
        </Select>
      </Field>
      {scope === 'region' ? (
        <ScopePicker
          kind="region"
          value={draft.regionId}
          onChange={(regionId) => onChange({ ...draft, regionId })}
          options={scopeOptions}
          validationMessage={problems.regionId}
        />
      ) : null}
      {scope === 'chapter' ? (
        <ScopePicker
          kind="chapter"
          value={draft.chapterId}
          onChange={(chapterId) => onChange({ ...draft, chapterId })}
          options={scopeOptions}
          validationMessage={problems.chapterId}
        />
      ) : null}
    </>
  );
}
