import { makeStyles, tokens } from '@fluentui/react-components';
import { PASSWORD_MIN_LENGTH } from '@tallyloom/core';

const useStyles = makeStyles({
  list: {
    margin: 0,
    paddingLeft: tokens.spacingHorizontalXL,
  },
});

/**
 * What makes a good password here (NIST SP 800-63B): length, not tricks. No rules about
 * digits, capitals or symbols, so none are listed.
 */
export function PasswordHints() {
  const styles = useStyles();
  return (
    <ul className={styles.list}>
      <li>At least {PASSWORD_MIN_LENGTH} characters.</li>
      <li>Long passphrases are welcome, spaces included: four or five words you will remember.</li>
      <li>No need to mix in digits, capitals or symbols.</li>
      <li>Not your name or e-mail, and not a password many people use.</li>
    </ul>
  );
}
