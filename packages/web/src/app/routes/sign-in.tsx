import {
  Button,
  Field,
  Input,
  makeStyles,
  MessageBar,
  MessageBarBody,
  tokens,
} from '@fluentui/react-components';
import { PageHeader } from '@/components/ui/page-header';

const noteId = 'sign-in-note';

const useStyles = makeStyles({
  // A plain bordered panel looks the part without pulling in Fluent's Card for one page.
  card: {
    maxWidth: '380px',
    padding: tokens.spacingHorizontalXL,
    border: `1px solid ${tokens.colorNeutralStroke2}`,
    borderRadius: tokens.borderRadiusLarge,
    boxShadow: tokens.shadow4,
    backgroundColor: tokens.colorNeutralBackground1,
  },
  form: { display: 'flex', flexDirection: 'column', gap: tokens.spacingVerticalM },
});

/** A placeholder until accounts and roles exist: the real form, with submission held back. */
export function SignInRoute() {
  const styles = useStyles();
  return (
    <>
      <PageHeader
        title="Sign in"
        description="Chapter leads, coordinators and staff sign in here."
      />
      <div className={styles.card}>
        <form
          className={styles.form}
          aria-describedby={noteId}
          // Nothing to send yet; Enter in a field must not reload the page.
          onSubmit={(event) => event.preventDefault()}
        >
          <MessageBar intent="info" id={noteId}>
            <MessageBarBody>
              Signing in is not switched on yet: it comes with accounts and roles. Until then every
              page is open.
            </MessageBarBody>
          </MessageBar>
          <Field label="E-mail">
            <Input type="email" name="email" autoComplete="username" />
          </Field>
          <Field label="Password">
            <Input type="password" name="password" autoComplete="current-password" />
          </Field>
          <Button type="submit" appearance="primary" disabledFocusable aria-describedby={noteId}>
            Sign in
          </Button>
        </form>
      </div>
    </>
  );
}
