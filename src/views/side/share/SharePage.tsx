/**
 * "Keep & share": everything that takes a design out of this page or brings one in — a link, a design
 * file, the library in this browser — plus a pinned reference to compare against and pictures of each view.
 */
import { CompareSection } from '../../compare/CompareSection.tsx';
import { PicturesSection } from '../../pictures/PicturesSection.tsx';
import { FileSection } from './FileSection.tsx';
import { LibrarySection } from './LibrarySection.tsx';
import { LinkSection } from './LinkSection.tsx';
import './share.css';

export function SharePage() {
  return (
    <>
      <LinkSection />
      <FileSection />
      <LibrarySection />
      <CompareSection />
      <PicturesSection />
    </>
  );
}
