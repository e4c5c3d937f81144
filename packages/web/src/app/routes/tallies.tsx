import { Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { can, ROLE_SCOPE } from '@tallyloom/core';
import { useSearchParams } from 'react-router-dom';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { PageHeader } from '@/components/ui/page-header';
import { ExportMenu } from '@/features/exports/components/export-menu';
import { useChapters } from '@/features/network/api/get-chapters';
import { TallyCalendar } from '@/features/tallies/components/tally-calendar';
import { useSessionUser } from '@/lib/session/use-session';

const useStyles = makeStyles({
  picker: { width: '320px', marginBottom: tokens.spacingVerticalL },
});

/** The chosen chapter lives in the URL (`?chapter=11`), so the view can be bookmarked. */
const chapterParam = 'chapter';

function parseChapterId(value: string | null): number | undefined {
  if (!value || !/^\d+$/.test(value)) return undefined;
  const id = Number(value);
  return id > 0 ? id : undefined;
}

/** Reviewers and national staff choose which chapter's months to see. */
function ChapterPicker() {
  const styles = useStyles();
  const user = useSessionUser();
  const [searchParams, setSearchParams] = useSearchParams();
  const chapterId = parseChapterId(searchParams.get(chapterParam));
  const chapters = useChapters(
    user && ROLE_SCOPE[user.role] === 'region' && user.regionId ? { regionId: user.regionId } : {},
  );
  const mayWrite = can(user?.role, 'tallies.write');

  if (chapters.isError) {
    return (
      <ErrorState
        title="The chapters could not be loaded"
        error={chapters.error}
        onRetry={() => void chapters.refetch()}
        retrying={chapters.isFetching}
      />
    );
  }
  return (
    <>
      <Field label="Chapter" className={styles.picker}>
        <Select
          value={chapterId === undefined ? '' : String(chapterId)}
          disabled={chapters.isPending}
          onChange={(_event, data) =>
            setSearchParams(data.value ? { [chapterParam]: data.value } : {}, { replace: true })
          }
        >
          <option value="">{chapters.isPending ? 'Loading chapters…' : 'Choose a chapter'}</option>
          {(chapters.data ?? []).map((chapter) => (
            <option key={chapter.id} value={chapter.id}>
              {chapter.name} ({chapter.regionName})
            </option>
          ))}
        </Select>
      </Field>
      {chapterId === undefined ? (
        <EmptyState title="Choose a chapter">
          Pick a chapter above to see its months: which are filed, returned or approved, and which
          are late or missing.
        </EmptyState>
      ) : (
        <TallyCalendar chapterId={chapterId} mayWrite={mayWrite} />
      )}
    </>
  );
}

/** Chapter lead home for tallies: the months due, how each stands, and what was returned. */
export function TalliesRoute() {
  const user = useSessionUser();
  const ownChapter = user && ROLE_SCOPE[user.role] === 'chapter';
  const [searchParams] = useSearchParams();
  // The months on screen are one chapter's: the export holds that chapter's filed tallies.
  const chapterId = ownChapter
    ? (user.chapterId ?? undefined)
    : parseChapterId(searchParams.get(chapterParam));
  return (
    <>
      <PageHeader
        title="Monthly tallies"
        description={
          ownChapter && user.chapterName
            ? `${user.chapterName}: each month's panels, blankets and people served, filed by the due day of the following month.`
            : "Each chapter's monthly figures, filed by the due day of the following month."
        }
        actions={
          chapterId === undefined ? undefined : (
            <ExportMenu
              target={{ table: 'tallies', filters: { chapterId } }}
              what="monthly tallies"
            />
          )
        }
      />
      {ownChapter ? (
        <TallyCalendar mayWrite={can(user.role, 'tallies.write')} />
      ) : (
        <ChapterPicker />
      )}
    </>
  );
}
