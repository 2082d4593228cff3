/** The "Design" page of the side column: the designer behind the roots, the design form, and the mask. */
import './design.css';
import { useRef, useState } from 'react';
import { selectDesignerStatus } from '../../../store/derived.ts';
import { workbenchStore } from '../../../store/useWorkbench.ts';
import { defaultForm } from './designKinds.ts';
import { formOf } from './designForm.ts';
import { DesignerForm } from './DesignerForm.tsx';
import { DesignerStatus } from './DesignerStatus.tsx';
import { MaskSection } from './MaskSection.tsx';

export function DesignPage() {
  const [form, setForm] = useState(() => {
    const { design } = workbenchStore.getState();
    return design.designer ? formOf(design.designer) : defaultForm('notch', design.sampleRate);
  });
  const formBox = useRef<HTMLDivElement>(null);
  const changeParameters = () => {
    const status = selectDesignerStatus(workbenchStore.getState());
    if (!status) return;
    setForm(formOf(status.spec));
    requestAnimationFrame(() => {
      formBox.current?.scrollIntoView({ block: 'nearest' });
      formBox.current?.querySelector('input')?.focus();
    });
  };
  return (
    <>
      <DesignerStatus onChangeParameters={changeParameters} />
      <div ref={formBox}>
        <DesignerForm form={form} setForm={setForm} />
      </div>
      <MaskSection />
    </>
  );
}
