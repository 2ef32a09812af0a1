/** Applies the lock-down of security.ts to the whole app: every web contents and the session. */
import { app, session, shell } from 'electron';
import { isAllowedRequest, lockDownContents, type RequestPolicy } from './security';

export function setupSecurity(policy: RequestPolicy): void {
  app.on('web-contents-created', (_event, contents) =>
    lockDownContents(contents, (url) => shell.openExternal(url)),
  );
  const ses = session.defaultSession;
  ses.setPermissionRequestHandler((_wc, _permission, callback) => callback(false));
  ses.setPermissionCheckHandler(() => false);
  ses.webRequest.onBeforeRequest((details, callback) =>
    callback({ cancel: !isAllowedRequest(details.url, policy) }),
  );
}
