import Box from '@mui/material/Box';
import { useEffect, useState } from 'react';

/**
 * A QR code of a link, for a phone's camera. The encoder is loaded only when the panel opens, so the board itself
 * stays small; it draws SVG, which needs no canvas and stays sharp at any size.
 */
export function JoinQr({ link, label }: { link: string; label: string }) {
  const [svg, setSvg] = useState<string | null>(null);
  useEffect(() => {
    let current = true;
    void import('qrcode')
      .then((qr) =>
        qr.toString(link, {
          type: 'svg',
          margin: 2,
          errorCorrectionLevel: 'M',
          color: { dark: '#000000', light: '#ffffff' },
        }),
      )
      .then((markup) => {
        if (current) setSvg(markup);
      })
      .catch(() => undefined);
    return () => {
      current = false;
    };
  }, [link]);
  if (!svg) return null;
  return (
    <Box
      component="img"
      src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`}
      alt={label}
      data-testid="join-qr"
      sx={{ width: 200, height: 200, borderRadius: 2, bgcolor: '#ffffff', p: 0.5 }}
    />
  );
}
