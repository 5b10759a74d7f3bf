/**
 * Copies every example file into the Markdown pages that quote it: a ```ts block that starts
 * with `// example: <path>` is replaced by the file's current text. tests/docs checks that
 * they agree, so run this after editing an example: `npm run sync-examples`.
 */
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';

const pages = [
  'README.md',
  ...readdirSync('docs')
    .filter((f) => f.endsWith('.md'))
    .map((f) => `docs/${f}`),
];
const block = /```ts\n\/\/ example: (\S+)\n[\s\S]*?```/g;
for (const page of pages) {
  const text = readFileSync(page, 'utf8');
  const synced = text.replace(
    block,
    (_, path: string) => `\`\`\`ts\n${readFileSync(path, 'utf8')}\`\`\``,
  );
  if (synced !== text) {
    writeFileSync(page, synced);
    console.log(`synced ${page}`);
  }
}
