import {
  makeStyles,
  Menu,
  MenuButton,
  MenuItem,
  MenuList,
  MenuPopover,
  MenuTrigger,
  Text,
  tokens,
} from '@fluentui/react-components';
import { PersonCircle20Regular, SignOut20Regular } from '@fluentui/react-icons';
import { ROLE_LABELS, type SessionUser } from '@tallyloom/core';
import { useNavigate } from 'react-router-dom';
import { paths } from '@/config/paths';
import { scopeLabel } from '@/lib/scope';
import { useSignOut } from '../api/sign-out';

const useStyles = makeStyles({
  button: { maxWidth: '320px', textAlign: 'start' },
  who: { display: 'flex', flexDirection: 'column', minWidth: 0, lineHeight: 1.25 },
  name: {
    whiteSpace: 'nowrap',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
    fontWeight: tokens.fontWeightSemibold,
  },
  role: {
    whiteSpace: 'nowrap',
    overflow: 'hidden',
    textOverflow: 'ellipsis',
    color: tokens.colorNeutralForeground2,
  },
});

/** "Role · scope", e.g. "Chapter lead · Alder Falls". */
export function roleAndScope(user: SessionUser): string {
  return `${ROLE_LABELS[user.role]} · ${scopeLabel(user)}`;
}

/** Who is signed in (name, role, scope), with the way to their account and out. */
export function UserMenu({ user }: { user: SessionUser }) {
  const styles = useStyles();
  const navigate = useNavigate();
  const signOut = useSignOut();
  return (
    <Menu positioning="below-end">
      <MenuTrigger disableButtonEnhancement>
        <MenuButton appearance="subtle" icon={<PersonCircle20Regular />} className={styles.button}>
          <span className={styles.who}>
            <Text size={300} className={styles.name}>
              {user.displayName}
            </Text>
            <Text size={200} className={styles.role}>
              {roleAndScope(user)}
            </Text>
          </span>
        </MenuButton>
      </MenuTrigger>
      <MenuPopover>
        <MenuList>
          <MenuItem
            icon={<PersonCircle20Regular />}
            onClick={() => void navigate(paths.account.getHref())}
          >
            My account
          </MenuItem>
          <MenuItem
            icon={<SignOut20Regular />}
            disabled={signOut.isPending}
            onClick={() => signOut.mutate()}
          >
            Sign out
          </MenuItem>
        </MenuList>
      </MenuPopover>
    </Menu>
  );
}
