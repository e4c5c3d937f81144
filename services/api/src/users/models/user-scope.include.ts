import { Chapter } from '../../chapters/models/chapter.model';
import { Region } from '../../regions/models/region.model';

/** A person with the names of their region, or of their chapter and its region. */
export const WITH_SCOPE_NAMES = [
  { model: Region, attributes: ['id', 'name'] },
  {
    model: Chapter,
    attributes: ['id', 'name', 'regionId'],
    include: [{ model: Region, attributes: ['id', 'name'] }],
  },
];
