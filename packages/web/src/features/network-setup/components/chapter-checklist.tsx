import {
  Button,
  Checkbox,
  Field,
  FieldContextProvider,
  makeStyles,
  Text,
  tokens,
} from '@fluentui/react-components';
import type { ChapterView } from '@tallyloom/core';
import { describeProblem } from '@/components/ui/error-state';
import type { NetworkOptions } from './network-options';

const useStyles = makeStyles({
  groups: {
    display: 'grid',
    gridTemplateColumns: 'repeat(auto-fill, minmax(180px, 1fr))',
    gap: `${tokens.spacingVerticalS} ${tokens.spacingHorizontalL}`,
    maxHeight: '260px',
    overflowY: 'auto',
    padding: tokens.spacingVerticalXS,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusMedium,
  },
  group: { border: 'none', margin: 0, padding: 0, minWidth: 0 },
  legend: { fontWeight: tokens.fontWeightSemibold, padding: 0 },
  option: { display: 'block' },
});

function byRegion(chapters: ChapterView[]): Array<[string, ChapterView[]]> {
  const groups = new Map<string, ChapterView[]>();
  for (const chapter of [...chapters].sort((a, b) => a.name.localeCompare(b.name))) {
    groups.set(chapter.regionName, [...(groups.get(chapter.regionName) ?? []), chapter]);
  }
  return [...groups.entries()].sort(([a], [b]) => a.localeCompare(b));
}

export interface ChapterChecklistProps {
  value: number[];
  onChange: (ids: number[]) => void;
  options: NetworkOptions;
  validationMessage?: string;
}

/** The chapters that serve an agency: checkboxes grouped by region, each group a fieldset. */
export function ChapterChecklist({
  value,
  onChange,
  options,
  validationMessage,
}: ChapterChecklistProps) {
  const styles = useStyles();
  const chosen = new Set(value);
  const toggle = (id: number, checked: boolean) =>
    onChange(checked ? [...value, id] : value.filter((candidate) => candidate !== id));
  const loadProblem =
    options.status === 'error'
      ? `The list of chapters could not be loaded: ${describeProblem(options.error).message}`
      : undefined;

  return (
    <Field
      label="Chapters that serve it"
      required
      hint="At least one; each of them can hand blankets to this agency."
      validationMessage={loadProblem ?? validationMessage}
    >
      {(fieldProps) => (
        // The field labels the group; each checkbox keeps its own label and id.
        <FieldContextProvider value={undefined}>
          <div role="group" {...fieldProps}>
            {options.status === 'pending' ? <Text>Loading chapters…</Text> : null}
            {options.status === 'error' && options.retry ? (
              <Button size="small" onClick={options.retry}>
                Load the list again
              </Button>
            ) : null}
            {options.status === 'success' ? (
              <div className={styles.groups}>
                {byRegion(options.chapters).map(([regionName, chapters]) => (
                  <fieldset key={regionName} className={styles.group}>
                    <legend className={styles.legend}>{regionName}</legend>
                    {chapters.map((chapter) => (
                      <Checkbox
                        key={chapter.id}
                        className={styles.option}
                        label={chapter.activeTo ? `${chapter.name} (closed)` : chapter.name}
                        checked={chosen.has(chapter.id)}
                        onChange={(_event, data) => toggle(chapter.id, data.checked === true)}
                      />
                    ))}
                  </fieldset>
                ))}
              </div>
            ) : null}
          </div>
        </FieldContextProvider>
      )}
    </Field>
  );
}
