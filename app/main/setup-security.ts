/** Applies the lock-down of security.ts to the whole app: every web contents and the session. */
import { app, session, shell } from 'electron';
import { isAllowedRequest, lockDownContents } from './security';

export function setupSecurity(devUrl?: string): void {
  app.on('web-contents-created', (_event, contents) =>
    lockDownContents(contents, shell.openExternal),
  );
  const ses = session.defaultSession;
  ses.setPermissionRequestHandler((_wc, _permission, callback) => callback(false));
  ses.setPermissionCheckHandler(() => false);
  ses.webRequest.onBeforeRequest((details, callback) =>
    callback({ cancel: !isAllowedRequest(details.url, devUrl) }),
  );
}
