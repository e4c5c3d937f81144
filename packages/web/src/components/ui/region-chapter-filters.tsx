import { Field, Select } from '@fluentui/react-components';
import type { ChapterView, RegionView } from '@tallyloom/core';
import { parseRouteId } from '@/lib/route-id';

export interface RegionChapterValue {
  regionId: number | undefined;
  chapterId: number | undefined;
}

export interface RegionChapterFiltersProps {
  value: RegionChapterValue;
  onChange: (value: RegionChapterValue) => void;
  /** Already limited to the person's scope by the API. */
  regions: RegionView[];
  chapters: ChapterView[];
  /** False where the server already narrows to one region (coordinators). */
  showRegion?: boolean;
  className?: string;
}

/**
 * The region and chapter pickers of a list's filters. A picker with one choice is left out, and
 * the chapters follow the chosen region.
 */
export function RegionChapterFilters({
  value,
  onChange,
  regions,
  chapters,
  showRegion = true,
  className,
}: RegionChapterFiltersProps) {
  const chaptersShown =
    value.regionId === undefined
      ? chapters
      : chapters.filter((chapter) => chapter.regionId === value.regionId);

  return (
    <>
      {showRegion && regions.length > 1 ? (
        <Field label="Region" className={className}>
          <Select
            value={value.regionId === undefined ? '' : String(value.regionId)}
            onChange={(_event, data) => {
              const regionId = parseRouteId(data.value);
              const chapter = chapters.find((c) => c.id === value.chapterId);
              // A chapter of another region would empty the list for no visible reason.
              const keepChapter = regionId === undefined || chapter?.regionId === regionId;
              onChange({ regionId, chapterId: keepChapter ? value.chapterId : undefined });
            }}
          >
            <option value="">All regions</option>
            {regions.map((region) => (
              <option key={region.id} value={region.id}>
                {region.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
      {chapters.length > 1 ? (
        <Field label="Chapter" className={className}>
          <Select
            value={value.chapterId === undefined ? '' : String(value.chapterId)}
            onChange={(_event, data) =>
              onChange({ regionId: value.regionId, chapterId: parseRouteId(data.value) })
            }
          >
            <option value="">All chapters</option>
            {chaptersShown.map((chapter) => (
              <option key={chapter.id} value={chapter.id}>
                {chapter.name}
              </option>
            ))}
          </Select>
        </Field>
      ) : null}
    </>
  );
}
