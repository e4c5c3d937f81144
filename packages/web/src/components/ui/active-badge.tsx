import { Badge } from '@fluentui/react-components';
import { CheckmarkCircle16Regular, SubtractCircle16Regular } from '@fluentui/react-icons';

/** "Active" or "Inactive" in words with an icon, so it never rests on colour alone. */
export function ActiveBadge({ active }: { active: boolean }) {
  return active ? (
    <Badge appearance="tint" color="success" icon={<CheckmarkCircle16Regular />}>
      Active
    </Badge>
  ) : (
    <Badge appearance="tint" color="subtle" icon={<SubtractCircle16Regular />}>
      Inactive
    </Badge>
  );
}
