import {
  Button,
  Menu,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
} from '@fluentui/react-components';
import { MoreHorizontal20Regular } from '@fluentui/react-icons';
import type { ReactElement } from 'react';

export interface RowAction {
  label: string;
  icon: ReactElement;
  onClick: () => void;
}

/** A row's actions behind one "…" button named after the row, reachable with Tab and arrows. */
export function RowActions({ name, actions }: { name: string; actions: RowAction[] }) {
  return (
    <Menu positioning="below-end">
      <MenuTrigger disableButtonEnhancement>
        <Button
          appearance="subtle"
          size="small"
          icon={<MoreHorizontal20Regular />}
          aria-label={`Actions for ${name}`}
        />
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          {actions.map((action) => (
            <MenuItem key={action.label} icon={action.icon} onClick={action.onClick}>
              {action.label}
            </MenuItem>
          ))}
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
