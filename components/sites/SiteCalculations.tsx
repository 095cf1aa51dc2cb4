import Link from 'next/link';
import type { SiteView } from '@/lib/sites/store';
import type { SiteCalculationItem } from '@/lib/sites/links';
import { calculatorPropsFromSite } from '@/lib/sites/sheet';
import { CALCULATOR_LIST } from '@/lib/calculators';
import { readUnitPreference } from '@/lib/units/server';
import { CalculationItem } from '@/components/calculations/CalculationItem';

/**
 * The worked calculations made from a site and, for its owner, every calculator opened with
 * the site's numbers (in the owner's units, as share links carry them); a calculation saved
 * there is linked to the site.
 */
export async function SiteCalculations({
  site,
  calculations,
}: {
  site: SiteView;
  calculations: SiteCalculationItem[];
}) {
  const units = site.mine ? await readUnitPreference() : 'US';
  const openWith = (tool: (typeof CALCULATOR_LIST)[number]['id']) => {
    const props = calculatorPropsFromSite(tool, site.current.survey, site.current.plan, units);
    return `/calculators/${tool}?${new URLSearchParams({ ...props, site: site.id })}`;
  };
  if (!site.mine && calculations.length === 0) return null;
  return (
    <section aria-labelledby="site-calculations" className="flex flex-col gap-2 font-sans" data-print-hide>
      <h2 id="site-calculations" className="font-serif text-xl font-semibold">
        Worked calculations from this site
      </h2>
      {calculations.length ? (
        <ul className="flex flex-col gap-2" data-testid="site-calculations">
          {calculations.map((c) => (
            <CalculationItem key={c.id} c={c} />
          ))}
        </ul>
      ) : (
        <p className="cw-muted text-sm">None yet.</p>
      )}
      {site.mine ? (
        <nav aria-label="Calculators with this site’s numbers" className="flex flex-col gap-1 text-sm">
          <p>Open a calculator with this site’s numbers; what you save there is listed here.</p>
          <ul className="flex flex-wrap gap-x-4 gap-y-1">
            {CALCULATOR_LIST.map((c) => (
              <li key={c.id}>
                <Link href={openWith(c.id)} className="cw-link inline-flex min-h-6 items-center">
                  {c.name}
                </Link>
              </li>
            ))}
          </ul>
        </nav>
      ) : null}
    </section>
  );
}
