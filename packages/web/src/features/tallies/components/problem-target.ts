import type { ReadForm, TallyForm } from './tally-form-model';

/** The scalar fields whose form name is the same dotted path as in TallyValues. */
const SAME_NAME = new Set([
  'panels.opening',
  'panels.accepted',
  'panels.usedInAssembly',
  'panels.closing',
  'receiptsDifferenceReason',
  'blankets.opening',
  'blankets.received',
  'blankets.closing',
  'volunteerHours',
  'notes',
]);

/** A form name as the form's own checks give it, e.g. 'blankets.given.2.partnerAgencyId'. */
const FORM_NAME =
  /^(panels\.setAside\.\w+|(blankets\.(assembled|given)|peopleServed)\.\d+\.[\w.]+)$/;

const LINE = /^(blankets\.assembled|blankets\.given|peopleServed)\[(\d+)\]/;

/**
 * The form field to put the cursor in for a problem about `field`: a form name, or a path into
 * TallyValues as the checks give it ('blankets.given[1].count'). For a group as a whole, its
 * first box. Undefined when the form has no such box (e.g. no "given out" lines yet).
 */
export function focusTargetOf(field: string, form: TallyForm, read: ReadForm): string | undefined {
  if (SAME_NAME.has(field) || FORM_NAME.test(field)) return field;
  const line = LINE.exec(field);
  if (line) {
    const [, path, index] = line;
    const fields =
      path === 'blankets.assembled'
        ? read.lineFields.assembled
        : path === 'blankets.given'
          ? read.lineFields.given
          : read.lineFields.peopleServed;
    const name = fields[Number(index)];
    if (name && path === 'blankets.given' && field.endsWith('.partnerAgencyId')) {
      return name.replace(/\.count$/, '.partnerAgencyId');
    }
    if (name && path === 'blankets.given' && field.endsWith('.blanketSizeId')) {
      return name.replace(/\.count$/, '.blanketSizeId');
    }
    if (name) return name;
  }
  if (field.startsWith('panels.setAside')) return 'panels.setAside.offSize';
  if (field.startsWith('blankets.assembled')) {
    return form.blankets.assembled.length ? 'blankets.assembled.0.count' : undefined;
  }
  if (field.startsWith('blankets.given')) {
    return form.blankets.given.length ? 'blankets.given.0.count' : undefined;
  }
  if (field.startsWith('peopleServed')) {
    return form.peopleServed.length ? 'peopleServed.0.counts.infants' : undefined;
  }
  if (field.startsWith('yarn')) return 'yarn.value';
  if (field.startsWith('panels')) return 'panels.closing';
  if (field.startsWith('blankets')) return 'blankets.closing';
  return undefined;
}
