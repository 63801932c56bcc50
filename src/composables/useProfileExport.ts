import { PROFILE_CAUTION, SYNTHETIC_DATA_NOTE } from '@shared/profile';

/** File-name safe form of a well name. */
export function fileStem(name: string): string {
  return name.replace(/[^A-Za-z0-9._-]+/g, '_').replace(/^_+|_+$/g, '') || 'profile';
}

function download(blob: Blob, fileName: string): void {
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileName;
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

export interface FigureExportOptions {
  /** Demo data: the figure must say "Synthetic demo data". */
  synthetic?: boolean;
}

/**
 * The figure as standalone SVG text. The figure draws with literal colours and carries the caution line (and, for
 * the demo basin, the synthetic-data line) itself; this only checks that they are there, so no export leaves them out.
 * @example const text = svgText(figure.svg, { synthetic: true });
 */
export function svgText(svg: SVGSVGElement, options: FigureExportOptions = {}): string {
  const copy = svg.cloneNode(true) as SVGSVGElement;
  copy.setAttribute('xmlns', 'http://www.w3.org/2000/svg');
  if (!copy.textContent?.includes(PROFILE_CAUTION)) throw new Error('The figure lost its caution line; not exported.');
  if (options.synthetic && !copy.textContent.includes(SYNTHETIC_DATA_NOTE))
    throw new Error('The figure of demo data does not say it is synthetic; not exported.');
  // Vue's scoped-style markers mean nothing outside the page.
  for (const el of [copy, ...Array.from(copy.querySelectorAll('*'))]) {
    for (const name of el.getAttributeNames()) if (name.startsWith('data-v-')) el.removeAttribute(name);
  }
  return `<?xml version="1.0" encoding="UTF-8"?>\n${new XMLSerializer().serializeToString(copy)}`;
}

/**
 * Saving the current figure as SVG or PNG (drawn at twice the screen size, so it stays crisp in a report) and the
 * computed curves as CSV; everything in the page, nothing sent anywhere.
 * @example const { exportPng } = useProfileExport(); await exportPng(figure.svg, 'AVX-08_profile');
 */
export function useProfileExport() {
  function exportSvg(svg: SVGSVGElement, stem: string, options: FigureExportOptions = {}): void {
    download(new Blob([svgText(svg, options)], { type: 'image/svg+xml' }), `${stem}.svg`);
  }

  async function exportPng(svg: SVGSVGElement, stem: string, options: FigureExportOptions = {}, scale = 2): Promise<void> {
    const width = Number(svg.getAttribute('width'));
    const height = Number(svg.getAttribute('height'));
    const url = URL.createObjectURL(new Blob([svgText(svg, options)], { type: 'image/svg+xml' }));
    try {
      const img = new Image();
      await new Promise<void>((resolve, reject) => {
        img.onload = () => resolve();
        img.onerror = () => reject(new Error('The figure could not be drawn as a picture.'));
        img.src = url;
      });
      const canvas = document.createElement('canvas');
      canvas.width = width * scale;
      canvas.height = height * scale;
      const ctx = canvas.getContext('2d');
      if (!ctx) throw new Error('This browser cannot draw the picture.');
      ctx.fillStyle = '#FFFFFF';
      ctx.fillRect(0, 0, canvas.width, canvas.height);
      ctx.scale(scale, scale);
      ctx.drawImage(img, 0, 0, width, height);
      const blob = await new Promise<Blob | null>((r) => canvas.toBlob(r, 'image/png'));
      if (!blob) throw new Error('The picture could not be encoded.');
      download(blob, `${stem}.png`);
    } finally {
      URL.revokeObjectURL(url);
    }
  }

  function exportCsv(text: string, stem: string): void {
    download(new Blob([text], { type: 'text/csv;charset=utf-8' }), `${stem}.csv`);
  }

  return { exportSvg, exportPng, exportCsv };
}
