/**
 * Where the built basemap lives; a module of its own so the server can find the files without loading
 * the build's (development-only) dependencies.
 */
import { fileURLToPath } from 'node:url';

/** The one archive file holding every tile (a folder of 40 000 small files would cost ≈ 158 MiB on disk). */
export const ARCHIVE_PATH = fileURLToPath(new URL('./basemap.pmtiles', import.meta.url));

/** tiles/fonts/, where the build copies the label fonts and the server reads them. */
export const FONTS_DIR = fileURLToPath(new URL('./fonts/', import.meta.url));
