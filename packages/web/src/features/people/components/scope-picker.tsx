import { Button, Field, Select } from '@fluentui/react-components';
import type { ChapterView, ScopeKind } from '@tallyloom/core';
import { describeProblem } from '@/components/ui/error-state';
import type { ScopeOptions } from './scope-options';

export interface ScopePickerProps {
  kind: Exclude<ScopeKind, 'network'>;
  value: number | null;
  onChange: (id: number | null) => void;
  options: ScopeOptions;
  validationMessage?: string;
}

function chaptersByRegion(chapters: ChapterView[]): Array<[string, ChapterView[]]> {
  const groups = new Map<string, ChapterView[]>();
  for (const chapter of [...chapters].sort((a, b) => a.name.localeCompare(b.name))) {
    const group = groups.get(chapter.regionName) ?? [];
    group.push(chapter);
    groups.set(chapter.regionName, group);
  }
  return [...groups.entries()].sort(([a], [b]) => a.localeCompare(b));
}

/** The region a coordinator covers, or the chapter a lead runs: a native select, grouped. */
export function ScopePicker({
  kind,
  value,
  onChange,
  options,
  validationMessage,
}: ScopePickerProps) {
  const label = kind === 'region' ? 'Region' : 'Chapter';
  const loadProblem =
    options.status === 'error'
      ? `The list of ${kind === 'region' ? 'regions' : 'chapters'} could not be loaded: ${describeProblem(options.error).message}`
      : undefined;

  return (
    <>
      <Field
        label={label}
        validationMessage={loadProblem ?? validationMessage}
        hint={
          kind === 'region'
            ? 'A regional coordinator sees and approves this region’s chapters.'
            : 'A chapter lead logs parcels and files tallies for this chapter.'
        }
      >
        <Select
          value={value === null ? '' : String(value)}
          disabled={options.status !== 'success'}
          onChange={(_event, data) => onChange(data.value === '' ? null : Number(data.value))}
        >
          <option value="">
            {options.status === 'pending'
              ? 'Loading…'
              : kind === 'region'
                ? 'Choose a region'
                : 'Choose a chapter'}
          </option>
          {kind === 'region'
            ? options.regions.map((region) => (
                <option key={region.id} value={region.id}>
                  {region.name}
                </option>
              ))
            : chaptersByRegion(options.chapters).map(([regionName, chapters]) => (
                <optgroup key={regionName} label={regionName}>
                  {chapters.map((chapter) => (
                    <option key={chapter.id} value={chapter.id}>
                      {chapter.activeTo ? `${chapter.name} (closed)` : chapter.name}
                    </option>
                  ))}
                </optgroup>
              ))}
        </Select>
      </Field>
      {options.status === 'error' && options.retry ? (
        <div>
          <Button size="small" onClick={options.retry}>
            Load the list again
          </Button>
        </div>
      ) : null}
    </>
  );
}
