import { Button, ButtonGroup, Intent } from '@blueprintjs/core';
import { IconNames } from '@blueprintjs/icons';
import { useState, type RefObject } from 'react';
import { downloadPngFigure, downloadSvgFigure } from '@/modules/correlation/utils/figureDownload';

export type FigureExportButtonsProps = {
  /** The chart's root <svg>. */
  figure: RefObject<SVGSVGElement | null>;
  title: string;
  /** Printed under the exported chart: units and what its marks mean (the on-screen text around it). */
  caption?: string;
};

/** Save one chart as SVG or PNG, figure-ready: titled, captioned, with every label inside the frame. */
export function FigureExportButtons({ figure, title, caption }: FigureExportButtonsProps) {
  const [problem, setProblem] = useState<string | null>(null);
  const handleSvg = () => {
    if (figure.current) downloadSvgFigure(figure.current, title, caption);
  };
  const handlePng = () => {
    if (!figure.current) return;
    setProblem(null);
    downloadPngFigure(figure.current, title, caption).catch((error: unknown) => setProblem(error instanceof Error ? error.message : 'export failed'));
  };
  return (
    <ButtonGroup variant="minimal" size="small">
      <Button icon={IconNames.MEDIA} text="SVG" onClick={handleSvg} title={`Save “${title}” as SVG`} />
      <Button icon={IconNames.MEDIA} text="PNG" onClick={handlePng} title={problem ?? `Save “${title}” as PNG`} intent={problem ? Intent.DANGER : Intent.NONE} />
    </ButtonGroup>
  );
}
