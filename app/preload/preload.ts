/**
 * Preload (sandboxed, built as CommonJS preload.cjs): exposes only the functions of createApi()
 * under `window.thermoshift`. ipcRenderer itself never crosses the bridge.
 */
import { contextBridge, ipcRenderer } from 'electron';
import { createApi, type Invoke } from './api';

const invoke: Invoke = (channel, request) => ipcRenderer.invoke(channel, request);

contextBridge.exposeInMainWorld('thermoshift', createApi(invoke));
