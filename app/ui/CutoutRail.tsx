/** The tool rail's "Check" group: start a proposal, draw a net-section line. */
import { CommandButton } from '../fields/CommandButton';

export function CutoutRail() {
  return (
    <div className="rail-group">
      <h3>Check</h3>
      <CommandButton name="proposal.new" />
      <CommandButton name="tool.netline">Net section</CommandButton>
    </div>
  );
}
