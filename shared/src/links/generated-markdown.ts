/** Deterministic, realistic-looking Markdown for throughput measurements (invented content). */
export function generatedMarkdown(pages: number): string[] {
  const out: string[] = [];
  for (let p = 0; p < pages; p++) {
    const parts = [`---\ntitle: Batch ${p}\ntags: [bench]\n---\n`, `# Batch ${p} overview\n`];
    for (let s = 0; s < 12; s++) {
      parts.push(`## Section ${s}\n`);
      parts.push(
        `The line crew checks **valve ${s}** before the [morning run](../batch-${(p + s) % pages}.md#section-${s}) ` +
          `and logs it in [[Shift Log]]; see <https://example.com/runs/${p}/${s}> or the [spec][spec-${s}].\n`,
      );
      parts.push(`- step one uses \`[not](a link)\`\n- step two: ![gauge](img/gauge-${s}.png)\n- step three\n`);
      parts.push('```sh\nrun --batch ' + p + '\n```\n');
      parts.push(`[spec-${s}]: /docs/spec/${s}\n`);
    }
    out.push(parts.join('\n'));
  }
  return out;
}
