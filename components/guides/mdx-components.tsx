import type { MDXComponents } from 'mdx/types';
import { Caution } from '@/components/Caution';
import { calculatorMdxComponents } from '@/components/calculators/mdx';
import { RamDiagram } from './RamDiagram';
import { ForUnits, U } from './ForUnits';

/** Everything a guide may use. Props arrive as strings (next-mdx-remote drops JS expressions). */
export const guideComponents: MDXComponents = {
  Caution,
  RamDiagram,
  U,
  ForUnits,
  ...calculatorMdxComponents,
  a: ({ href = '', ...props }) =>
    /^https?:\/\//.test(href) ? (
      <a href={href} rel="noopener noreferrer" className="cw-link" {...props} />
    ) : (
      <a href={href} className="cw-link" {...props} />
    ),
  table: (props) => (
    <div className="my-4 overflow-x-auto">
      <table className="w-full border-collapse font-sans text-sm" {...props} />
    </div>
  ),
};
