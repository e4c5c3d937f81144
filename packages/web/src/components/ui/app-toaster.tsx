import {
  Toast,
  Toaster,
  ToastTitle,
  useToastController,
  type ToastIntent,
} from '@fluentui/react-components';
import { useCallback } from 'react';

const appToasterId = 'tallyloom-toaster';

/** The one place short confirmations appear ("Invitation sent to …"). */
export function AppToaster() {
  return <Toaster toasterId={appToasterId} position="bottom-end" pauseOnHover pauseOnWindowBlur />;
}

/** Shows a short confirmation; the screen that did the work decides what it says. */
export function useNotify() {
  const { dispatchToast } = useToastController(appToasterId);
  return useCallback(
    (message: string, intent: ToastIntent = 'success') => {
      dispatchToast(
        <Toast>
          <ToastTitle>{message}</ToastTitle>
        </Toast>,
        { intent, timeout: 6000 },
      );
    },
    [dispatchToast],
  );
}
