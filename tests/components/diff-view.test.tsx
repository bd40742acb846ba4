// The shared diff view: added and removed lines are told apart by a sign and words, not colour alone,
// and both files' line numbers are shown. The diff is made with the `diff` package (createTwoFilesPatch).
import { render, screen } from '@testing-library/react-native';
import { createTwoFilesPatch } from 'diff';
import { DiffView } from '@/components/diff';

const before = '@ECHO OFF\r\nPATH C:\\DOS\r\nMODE LPT1:=COM2:\r\nC:\\OFFMENU\\OFFMENU.EXE\r\n';
const after = '@ECHO OFF\r\nPATH C:\\DOS\r\nREM MODE LPT1:=COM2:\r\nMODE LPT1:=COM1:\r\nC:\\OFFMENU\\OFFMENU.EXE\r\n';
const patch = createTwoFilesPatch('a/AUTOEXEC.BAT', 'b/AUTOEXEC.BAT', before, after);

describe('<DiffView />', () => {
  it('labels added and removed lines in words and shows the counts', () => {
    render(<DiffView file="AUTOEXEC.BAT" diff={patch} layout="unified" />);
    expect(screen.getByTestId('diff-counts')).toHaveTextContent('+ 2 added · - 1 removed');
    expect(screen.getByLabelText('new line 3, added: REM MODE LPT1:=COM2:')).toBeOnTheScreen();
    expect(screen.getByLabelText('new line 4, added: MODE LPT1:=COM1:')).toBeOnTheScreen();
    expect(screen.getByLabelText('old line 3, removed: MODE LPT1:=COM2:')).toBeOnTheScreen();
  });

  it('keeps the same rows side by side', () => {
    render(<DiffView file="AUTOEXEC.BAT" diff={patch} layout="split" />);
    expect(screen.getByTestId('diff-old-3')).toBeOnTheScreen();
    expect(screen.getByTestId('diff-line-4')).toBeOnTheScreen();
  });

  it('says so when a file does not change', () => {
    render(<DiffView file="CONFIG.SYS" diff="" />);
    expect(screen.getByTestId('diff-counts')).toHaveTextContent('no change');
  });
});
