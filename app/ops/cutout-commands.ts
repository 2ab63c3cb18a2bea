/**
 * The cutout check's commands, registered into the one command table (app/command-table.ts):
 * proposals (new, show, rename, delete), limits and hole rules, and the net-section lines with
 * their drawing tool. What each does lives beside this file (proposals.ts, limits.ts,
 * net-lines.ts); the panels, the keyboard and the tests dispatch by these names.
 */
import type { CommandRegistry } from '../commands/registry';
import { addLimit, removeLimit, setHoleRules, setLimitValue, useExampleLimits } from './limits';
import { addNetLine, deleteNetLine, setNetLine } from './net-lines';
import { deleteProposal, hasProposals, newProposal, proposalActive, renameProposal, switchProposal } from './proposals';

export function registerCutoutCommands(r: CommandRegistry): void {
  r.register({
    name: 'proposal.new',
    label: 'New proposal',
    group: 'edit',
    hint: 'Start a proposal (the section as the fabricator proposes to cut it) as a copy of the baseline, and show it',
    perform: newProposal,
  });
  r.register({ name: 'proposal.show', label: 'Show proposal', group: 'edit', hint: 'Show and edit a proposal (by name)', perform: switchProposal });
  r.register({
    name: 'proposal.baseline',
    label: 'Show baseline',
    group: 'edit',
    hint: 'Show and edit the baseline section',
    enabled: proposalActive,
    active: (c) => hasProposals(c) && !proposalActive(c),
    perform: (c) => switchProposal(c, null),
  });
  r.register({ name: 'proposal.rename', label: 'Rename proposal', group: 'edit', enabled: hasProposals, perform: renameProposal });
  r.register({ name: 'proposal.delete', label: 'Delete proposal', group: 'edit', enabled: hasProposals, perform: deleteProposal });

  r.register({ name: 'limits.set', label: 'Set a limit', group: 'edit', perform: (c, arg) => void setLimitValue(c, arg) });
  r.register({ name: 'limits.add', label: 'Add a limit', group: 'edit', perform: (c, arg) => void addLimit(c, arg) });
  r.register({ name: 'limits.remove', label: 'Remove a limit', group: 'edit', perform: (c, arg) => void removeLimit(c, arg) });
  r.register({ name: 'limits.examples', label: 'Use the example limits', group: 'edit', enabled: (c) => !!c.store.getState().doc.limits, perform: useExampleLimits });
  r.register({ name: 'holeRules.set', label: 'Hole rules', group: 'edit', perform: setHoleRules });

  r.register({
    name: 'tool.netline',
    label: 'Net-section line',
    group: 'tool',
    keys: ['n'],
    hint: 'Draw a straight line across the section: gross and net length, each hole or gap on it',
    active: (c) => c.store.getState().tool === 'netline',
    perform: (c) => c.store.setState({ tool: 'netline', pathArc: false }),
  });
  r.register({ name: 'netline.add', label: 'Add a net-section line', group: 'edit', perform: (c, arg) => void addNetLine(c, arg) });
  r.register({ name: 'netline.set', label: 'Change a net-section line', group: 'edit', perform: (c, arg) => void setNetLine(c, arg) });
  r.register({ name: 'netline.delete', label: 'Delete a net-section line', group: 'edit', perform: deleteNetLine });
}
