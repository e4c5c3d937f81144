import { makeStaticStyles, tokens } from '@fluentui/react-components';

/** The few page-wide rules Fluent leaves to the app: no stray body margin, our canvas behind it. */
export const useGlobalStyles = makeStaticStyles({
  body: {
    margin: 0,
    backgroundColor: tokens.colorNeutralBackground1,
  },
});
