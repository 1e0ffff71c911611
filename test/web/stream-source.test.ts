import { describe, expect, it } from 'vitest';
import { CancelledError, sha256Hex, streamText } from '../../web/worker/stream-source';
import { tablePreview } from '../../web/worker/table-preview';

const collect = async (blob: Blob): Promise<string> => {
  let text = '';
  await streamText(blob, { push: (t) => (text += t) });
  return text;
};

describe('reading a picked file in the worker', () => {
  it('passes UTF-8 text through unchanged, multi-byte characters included', async () => {
    const text = 'taxon,oldest_ma\nÆgirocrinus,100\n日本,90\n';
    expect(await collect(new Blob([text]))).toBe(text);
  });

  it('names the line and byte of invalid UTF-8 instead of replacing it', async () => {
    const bytes = new Uint8Array([...new TextEncoder().encode('a,b\r\nc,d\n'), 0x41, 0xff, 0x0a]);
    await expect(collect(new Blob([bytes]))).rejects.toThrow('line 3, encoding "invalid UTF-8 at byte 10 (counting from 0)": expected UTF-8 text; save the file as UTF-8');
  });

  it('refuses UTF-16 from its byte-order mark', async () => {
    await expect(collect(new Blob([new Uint8Array([0xff, 0xfe, 0x61, 0x00])]))).rejects.toThrow(/UTF-16/);
  });

  it('stops between chunks when cancelled', async () => {
    const controller = new AbortController();
    controller.abort();
    await expect(streamText(new Blob(['x']), { push: () => undefined, signal: controller.signal })).rejects.toBeInstanceOf(CancelledError);
  });

  it('hashes with SHA-256 (FIPS 180-2 test vector for "abc")', async () => {
    expect(await sha256Hex(new Blob(['abc']))).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});

describe('the import preview', () => {
  it('shows the header, first rows and the columns found by their names', async () => {
    const csv = 'Species,oldest_ma,youngest_ma,paleolat,paleolng,extra\n"<img src=x onerror=alert(1)>",100,90,10,20,z\n';
    const preview = await tablePreview(new Blob([csv]), 'hostile.csv');
    expect(preview.header).toEqual(['Species', 'oldest_ma', 'youngest_ma', 'paleolat', 'paleolng', 'extra']);
    expect(preview.rows[0][0]).toBe('<img src=x onerror=alert(1)>');
    expect(preview.detected).toMatchObject({ oldest_ma: 'oldest_ma', youngest_ma: 'youngest_ma', palaeo_lat: 'paleolat', palaeo_lon: 'paleolng' });
  });

  it('says why the detected columns are not enough', async () => {
    const preview = await tablePreview(new Blob(['name,age\nA,10\n']), 'short.csv');
    expect(preview.problem).toMatch(/taxon|age|position/);
  });
});
