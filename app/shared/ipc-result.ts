/**
 * What every IPC handler returns: the value, or a message a lab user can read. The renderer shows
 * the message; it never receives a stack trace or a file-system path it did not choose.
 */
export type IpcResult<T> = { ok: true; value: T } | { ok: false; message: string };

export const ipcOk = <T>(value: T): IpcResult<T> => ({ ok: true, value });
export const ipcFail = <T = never>(message: string): IpcResult<T> => ({ ok: false, message });
