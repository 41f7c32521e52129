import { fontSans } from './theme';

/**
 * The attributes every chart's `<svg>` shares: its size in px and viewBox, the role of an image named
 * by its `<title>` and described by its `<desc>` (ids `${uid}-title` and `${uid}-desc`), and its type.
 * Spread them first: `<svg ref={ref} {...chartSvgAttributes(uid, w, h, fontPx)} className="…">`.
 */
export function chartSvgAttributes(uid: string, widthPx: number, heightPx: number, fontPx: number) {
  return {
    xmlns: 'http://www.w3.org/2000/svg',
    width: widthPx,
    height: heightPx,
    viewBox: `0 0 ${widthPx} ${heightPx}`,
    role: 'img',
    'aria-labelledby': `${uid}-title`,
    'aria-describedby': `${uid}-desc`,
    style: { fontFamily: fontSans, fontSize: fontPx },
  } as const;
}
