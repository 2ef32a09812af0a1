import { describe, expect, it } from 'vitest';
import { mount } from '@vue/test-utils';
import { readFileSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import ImportPreview from '../../../app/renderer/src/components/ImportPreview.vue';
import { useImportSession } from '../../../app/renderer/src/composables/useImportSession';
import { useEngine } from '../../../app/renderer/src/engine/useEngine';

const SEAL = join(process.cwd(), 'samples', 'seal-dma');
const files = readdirSync(SEAL)
  .filter((f) => f.endsWith('.txt'))
  .map((name) => ({ name, text: readFileSync(join(SEAL, name), 'utf8') }));

describe('ImportPreview', () => {
  it('ImportPreview lists the isotherms and the recognised columns of one file per isotherm', async () => {
    const session = useImportSession(useEngine({ createWorker: () => null }));
    await session.start(files);
    const w = mount(ImportPreview, { props: { session } });
    expect(w.findAll('[data-role="import-groups"] tr')).toHaveLength(11);
    expect(w.text()).toMatch(/and 10 more with the same columns/);
    expect(w.text()).toMatch(/MPa → Pa/);
    expect(w.find('[data-role="import-accept"]').attributes('disabled')).toBeUndefined();
    await w.find('[data-role="import-accept"]').trigger('click');
    expect(w.emitted('accept')).toHaveLength(1);
  });

  it('ImportPreview re-reads the files when a column is mapped to another role', async () => {
    const session = useImportSession(useEngine({ createWorker: () => null }));
    await session.start(files.slice(0, 3));
    await session.mapColumn({ file: files[0].name, column: 4, role: 'ignore' });
    const report = session.result.value!.files.find((f) => f.file === files[0].name)!;
    expect(report.columns[3]).toMatchObject({ role: 'ignore', recognisedBy: 'mapping' });
    const w = mount(ImportPreview, { props: { session } });
    expect(w.text()).toMatch(/your mapping/);
  });

  it('ImportPreview shows the importer’s message and keeps “use” disabled for unreadable files', async () => {
    const session = useImportSession(useEngine({ createWorker: () => null }));
    await session.start([{ name: 'empty.csv', text: '' }]);
    const w = mount(ImportPreview, { props: { session } });
    expect(w.find('[data-role="import-error"]').text()).toMatch(/empty\.csv/);
    expect(w.find('[data-role="import-accept"]').attributes('disabled')).toBeDefined();
  });
});
