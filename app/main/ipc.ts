/**
 * Registration of IPC handlers. Every handler: ignores senders that are not the app's own window
 * (main frame, app URL), validates the payload with its zod schema, and returns
 * `{ ok: true, value } | { ok: false, message }`, logging enough context to reproduce a failure.
 */
import type { IpcMainInvokeEvent } from 'electron';
import type { IpcChannel, IpcRequest, IpcResponse } from '../shared/ipc-channels';
import { IPC_SCHEMAS } from '../shared/ipc-schemas';
import { ipcFail, ipcOk, type IpcResult } from '../shared/ipc-result';
import { isSameOrigin } from './origin';

/** The part of ipcMain used here. */
export interface IpcMainLike {
  handle(
    channel: string,
    listener: (event: IpcMainInvokeEvent, payload: unknown) => Promise<unknown>,
  ): void;
}

export type SenderCheck = (event: IpcMainInvokeEvent) => boolean;

/** The fields of the app window that identify it. */
export interface AppWindowRef {
  webContentsId: number;
  /**
   * The one origin the app page is served from: app://thermoshift, or in an unpackaged run the
   * dev server's exact origin (renderer-source.ts).
   */
  origin: string;
}

/**
 * True when the request comes from the main frame of the app window, showing a page of the app's
 * origin (same scheme, host and port). Subframes and other windows are refused (Electron
 * security checklist: validate the sender).
 */
export function isTrustedSender(event: IpcMainInvokeEvent, app: AppWindowRef | null): boolean {
  if (!app) return false;
  const frame = event.senderFrame;
  if (!frame || event.sender.id !== app.webContentsId) return false;
  if (frame !== event.sender.mainFrame) return false;
  return isSameOrigin(frame.url, app.origin);
}

export type Handler<C extends IpcChannel> = (
  request: IpcRequest<C>,
) => Promise<IpcResponse<C>> | IpcResponse<C>;

export interface HandleOptions {
  ipcMain: IpcMainLike;
  isTrusted: SenderCheck;
  log?: (message: string) => void;
}

export function handleChannel<C extends IpcChannel>(
  channel: C,
  handler: Handler<C>,
  { ipcMain, isTrusted, log = (m) => console.error(m) }: HandleOptions,
): void {
  ipcMain.handle(channel, async (event, payload): Promise<IpcResult<IpcResponse<C>>> => {
    if (!isTrusted(event)) {
      log(
        `[ipc] ${channel}: refused a request from an untrusted sender (${event.senderFrame?.url})`,
      );
      return ipcFail('Request refused: it did not come from the Thermoshift window.');
    }
    const parsed = IPC_SCHEMAS[channel].safeParse(payload);
    if (!parsed.success) {
      const what = parsed.error.issues
        .map((i) => `${i.path.join('.') || 'request'}: ${i.message}`)
        .join('; ');
      log(`[ipc] ${channel}: invalid payload (${what})`);
      return ipcFail(`Request refused: the ${channel} request is invalid (${what}).`);
    }
    try {
      return ipcOk(await handler(parsed.data as IpcRequest<C>));
    } catch (e) {
      const message = e instanceof Error ? e.message : String(e);
      log(`[ipc] ${channel}: ${message}`);
      return ipcFail(message);
    }
  });
}
