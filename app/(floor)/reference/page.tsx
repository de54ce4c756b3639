import { ComingArea } from '@/components/ui/coming-area';

export const metadata = { title: 'Reference' };

export default function ReferencePage() {
  return (
    <ComingArea
      title="Reference"
      purpose="The reference edition in force: enthalpies of formation, ionization energies, electron-gain enthalpies, hydration enthalpies, radii and more, each with its source."
      status="Browsing, drafting, CSV import and approval of editions arrive with the reference-edition release."
    />
  );
}
