/** The editor's layout: top bar, tool rail, canvas, side panel and status bar. */
import { useEffect, useRef } from 'react';
import { EditorContext, type EditorHandle } from './context';
import { installKeyboard } from './keyboard';
import { openFileText } from './exchange/open';
import { HiddenFileInput } from './exchange/FileInput';
import { Canvas } from './canvas/Canvas';
import { DimensionCaption } from './canvas/DimensionCaption';
import { CutPanel } from './panel/CutPanel';
import { LineResults } from './panel/LineResults';
import { Caution, ResultsPanel } from './panel/ResultsPanel';
import { SelectionPanel } from './panel/SelectionPanel';
import { TorsionPanel } from './panel/TorsionPanel';
import { ShapeList } from './panel/ShapeList';
import { StatusBar, ToolRail, TopBar } from './ui/Bars';
import { Notice } from './ui/Notice';
import { ReportOverlay } from './ui/ReportOverlay';
import { ExchangeDialogs } from './exchange/ExchangeDialogs';
import { TitleBlockDialog } from './ui/TitleBlock';
import { CheckerDialog } from './ui/CheckerDialog';
import { downloadBlob } from './exchange/exports';
import { FirstRunGuide } from './ui/FirstRunGuide';
import { QuestionDialog } from './ui/QuestionDialog';
import { LoadsPanel } from './panel/LoadsPanel';
import { MaterialResults } from './panel/MaterialResults';
import { MaterialLegend } from './ui/MaterialLegend';
import { MaterialsDialog } from './ui/MaterialsDialog';
import { ProposalStrip } from './ui/ProposalStrip';
import { ChangeLegend } from './ui/ChangeLegend';
import { ComparePanel } from './panel/ComparePanel';
import { LimitsEditor } from './panel/LimitsEditor';
import { CautionsPanel } from './panel/CautionsPanel';
import { NetSectionPanel } from './panel/NetSectionPanel';

export function App({ editor }: { editor: EditorHandle }) {
  const fileInput = useRef<HTMLInputElement>(null);

  useEffect(() => {
    editor.ctx.io = {
      pickFile: () => {
        fileInput.current?.click();
        return Promise.resolve(null);
      },
      download: (name, text) => downloadBlob(name, new Blob([text], { type: 'application/json' })),
    };
    editor.ctx.openReport = () => editor.store.setState({ reportOpen: true });

    return installKeyboard(editor);
  }, [editor]);

  return (
    <EditorContext.Provider value={editor}>
      <div className="app">
        <TopBar />
        <ToolRail />
        <main className="stage">
          <Canvas />
          <MaterialLegend />
          <DimensionCaption />
          <ProposalStrip />
          <ChangeLegend />
          <Notice />
          <FirstRunGuide />
        </main>
        <aside className="panel" aria-label="Selection and results">
          {/* Two scroll areas: editing above, results below, so the numbers stay in view
              while a shape is edited. */}
          <div className="panel-scroll panel-edit">
            <SelectionPanel />
            <ShapeList />
          </div>
          <div className="panel-scroll panel-results">
            <ComparePanel />
            <LimitsEditor />
            <ResultsPanel />
            <LineResults />
            <MaterialResults />
            <LoadsPanel />
            <TorsionPanel />
            <CutPanel />
            <CautionsPanel />
            <NetSectionPanel />
          </div>
          <Caution />
        </aside>
        <StatusBar />
        <ReportOverlay />
        <ExchangeDialogs />
        <TitleBlockDialog />
        <QuestionDialog />
        <MaterialsDialog />
        <CheckerDialog />
        <HiddenFileInput inputRef={fileInput} accept=".json,application/json,.dxf" testId="file-input" onText={(name, text) => openFileText(editor.ctx, name, text)} />
      </div>
    </EditorContext.Provider>
  );
}
