import { describe, expect, it } from 'vitest';
import { inquiryFormSnippet, inquiryFormUrl } from './inquiry-form-address';

describe('inquiry form address', () => {
  it('is the portal form of the firm’s slug', () => {
    expect(inquiryFormUrl('http://localhost:4300', 'fernhollow')).toBe('http://localhost:4300/portal/f/fernhollow/inquiry');
    expect(inquiryFormUrl('https://app.example/', 'a b')).toBe('https://app.example/portal/f/a%20b/inquiry');
  });

  it('embeds as a plain link (the form may not be framed), the firm name escaped', () => {
    const snippet = inquiryFormSnippet('https://app.example/portal/f/x/inquiry', 'Lime & "Glaze" <Co>');
    expect(snippet).toMatch(/^<a href="https:\/\/app\.example\/portal\/f\/x\/inquiry" target="_blank" rel="noopener" /);
    expect(snippet).toContain('Lime &amp; &quot;Glaze&quot; &lt;Co&gt;');
    expect(snippet).not.toContain('<iframe');
  });
});
