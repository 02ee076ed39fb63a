import { Toast, ToastBody, Toaster, ToastTitle, useId, useToastController } from '@fluentui/react-components';
import { useEffect } from 'react';
import { registerNoticeSink } from '@/lib/notify';

/** The app's one toaster; shows notices raised anywhere through lib/notify. */
export function AppToaster() {
  const toasterId = useId('app-toaster');
  const { dispatchToast } = useToastController(toasterId);
  useEffect(
    () =>
      registerNoticeSink((notice) =>
        dispatchToast(
          <Toast>
            <ToastTitle>{notice.title}</ToastTitle>
            {notice.body && <ToastBody>{notice.body}</ToastBody>}
          </Toast>,
          { intent: notice.intent, timeout: notice.intent === 'error' ? 8000 : 4000 },
        ),
      ),
    [dispatchToast],
  );
  return <Toaster toasterId={toasterId} position="bottom-end" pauseOnHover pauseOnWindowBlur />;
}
