/**
 * Files dropped anywhere on the window: shows a drop hint while dragging and hands the files over
 * as text. Listeners are removed when the scope is disposed.
 */
import { onScopeDispose, ref, type Ref } from 'vue';
import { readFiles, type TextFile } from '../platform/file-access';

export function useFileDrop(
  onFiles: (files: TextFile[]) => void,
  target: Window = window,
): { dragging: Ref<boolean> } {
  const dragging = ref(false);
  let depth = 0;
  const hasFiles = (e: DragEvent): boolean =>
    !!e.dataTransfer && [...e.dataTransfer.types].includes('Files');
  const enter = (e: DragEvent): void => {
    if (!hasFiles(e)) return;
    e.preventDefault();
    depth++;
    dragging.value = true;
  };
  const over = (e: DragEvent): void => {
    if (hasFiles(e)) e.preventDefault();
  };
  const leave = (): void => {
    depth = Math.max(0, depth - 1);
    if (depth === 0) dragging.value = false;
  };
  const drop = (e: DragEvent): void => {
    e.preventDefault();
    depth = 0;
    dragging.value = false;
    const files = e.dataTransfer?.files;
    if (files && files.length) void readFiles(files).then(onFiles);
  };
  target.addEventListener('dragenter', enter);
  target.addEventListener('dragover', over);
  target.addEventListener('dragleave', leave);
  target.addEventListener('drop', drop);
  onScopeDispose(() => {
    target.removeEventListener('dragenter', enter);
    target.removeEventListener('dragover', over);
    target.removeEventListener('dragleave', leave);
    target.removeEventListener('drop', drop);
  });
  return { dragging };
}
