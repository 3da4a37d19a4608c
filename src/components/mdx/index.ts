/** What page authors can use in MDX without an import (passed to every page's <Content>). */
import Calculator from './Calculator.astro';
import Caution from './Caution.astro';
import Note from './Note.astro';

export const mdxComponents = { Calculator, Caution, Note };
