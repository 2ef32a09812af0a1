import { describe, it, expect } from 'vitest';
import { htmlTable } from '../../../core/report/html-table';

describe('htmlTable()', () => {
  it('htmlTable() escapes cells, right-aligns numeric columns and adds row classes and a note', () => {
    const html = htmlTable({
      id: 't',
      caption: 'C <1>',
      head: ['name', 'value'],
      rows: [
        ['a & b', '1.5'],
        ['c', '2'],
      ],
      numeric: [1],
      rowClass: [undefined, 'excluded'],
      note: 'note "x"',
    });
    expect(html).toContain('<caption>C &lt;1&gt;</caption>');
    expect(html).toContain('<td>a &amp; b</td><td class="num">1.5</td>');
    expect(html).toContain('<tr class="excluded">');
    expect(html).toContain('<p class="table-note">note &quot;x&quot;</p>');
    expect(html.match(/<tr/g)).toHaveLength(3);
  });
  it('htmlTable() renders an empty body', () => {
    expect(htmlTable({ id: 'e', caption: 'e', head: ['a'], rows: [] })).toContain(
      '<tbody></tbody>',
    );
  });
});
