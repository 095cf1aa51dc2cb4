import type { Metadata, Viewport } from 'next';
import type { ReactNode } from 'react';
import '@fontsource/literata/400.css';
import '@fontsource/literata/400-italic.css';
import '@fontsource/literata/600.css';
import './globals.css';
import { SiteHeader } from '@/components/SiteHeader';
import { SiteFooter } from '@/components/SiteFooter';
import { UnitsProvider } from '@/components/units/UnitsProvider';
import { Providers } from '@/components/account/Providers';
import { RegisterServiceWorker } from '@/components/offline/RegisterServiceWorker';
import { palette } from '@/tailwind.config';
import { UNITS_FIRST_PAINT_SCRIPT } from '@/lib/units/first-paint';
import { SITE_DESCRIPTION, SITE_NAME, siteUrl } from '@/lib/site';

export const metadata: Metadata = {
  metadataBase: new URL(siteUrl()),
  title: { default: `${SITE_NAME} — hydraulic ram pumps, with the numbers`, template: `%s · ${SITE_NAME}` },
  description: SITE_DESCRIPTION,
  applicationName: SITE_NAME,
  openGraph: { siteName: SITE_NAME, type: 'website' },
};

export const viewport: Viewport = {
  width: 'device-width',
  initialScale: 1,
  themeColor: [
    { media: '(prefers-color-scheme: light)', color: palette.creek.DEFAULT },
    { media: '(prefers-color-scheme: dark)', color: palette.creek[900] },
  ],
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    // the first-paint script sets data-units before React hydrates
    <html lang="en" suppressHydrationWarning>
      <head>
        <script dangerouslySetInnerHTML={{ __html: UNITS_FIRST_PAINT_SCRIPT }} />
      </head>
      <body>
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-limestone-50 focus:px-3 focus:py-2"
        >
          Skip to content
        </a>
        <Providers>
          <UnitsProvider>
            <SiteHeader />
            <main id="main" className="mx-auto w-full max-w-5xl flex-1 px-4 py-6">
              {children}
            </main>
            <SiteFooter />
            <RegisterServiceWorker />
          </UnitsProvider>
        </Providers>
      </body>
    </html>
  );
}
