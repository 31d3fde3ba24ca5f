import path from 'node:path';
import { build, type Rolldown } from 'vite';

/**
 * Bundles browser-uploader.ts into one ES module the test page can load, so the
 * browser runs the same uploadthing client code the app ships.
 */
export async function buildBrowserUploader(): Promise<string> {
  const result = await build({
    configFile: false,
    logLevel: 'silent',
    root: import.meta.dirname,
    define: { 'process.env.NODE_ENV': JSON.stringify('production') },
    build: {
      write: false,
      minify: false,
      lib: { entry: path.join(import.meta.dirname, 'browser-uploader.ts'), formats: ['es'], fileName: 'browser-uploader' },
    },
  });
  const outputs = (Array.isArray(result) ? result : [result]) as Rolldown.RolldownOutput[];
  const chunk = outputs.flatMap((output) => output.output).find((item) => item.type === 'chunk' && item.isEntry);
  if (!chunk || chunk.type !== 'chunk') throw new Error('The browser uploader bundle has no entry chunk');
  return chunk.code;
}
