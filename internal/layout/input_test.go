package layout

import (
	"errors"
	"fmt"
	"os"
	"path/filepath"
	"strings"
	"testing"

	"arcwright/internal/geometry"
	"arcwright/internal/planner"
)

// TestLoadRefusesNonRegular checks that devices and directories are
// refused before reading, with a clear error and no endless read (issue 10,
// item 5: `validate /dev/zero` used to read until killed).
func TestLoadRefusesNonRegular(t *testing.T) {
	for _, path := range []string{"/dev/zero", os.DevNull, t.TempDir()} {
		t.Run(path, func(t *testing.T) {
			_, _, err := Load(path)
			if !errors.Is(err, ErrRead) {
				t.Fatalf("Load: got %v, want an error wrapping ErrRead", err)
			}
			if !strings.Contains(err.Error(), "regular file") && !strings.Contains(err.Error(), "directory") {
				t.Errorf("Load: got %q, want it to say it is not a regular file", err)
			}
			if _, err := LoadAsBuilt(path, &planner.Request{LengthUnit: "m", Cell: geometry.Cell{Ceiling: 4}}); !errors.Is(err, ErrRead) {
				t.Errorf("LoadAsBuilt: got %v, want an error wrapping ErrRead", err)
			}
		})
	}
}

// TestLoadRefusesLargeFile checks the MaxInputSize cap (16 MiB).
func TestLoadRefusesLargeFile(t *testing.T) {
	path := filepath.Join(t.TempDir(), "big.yaml")
	f, err := os.Create(path)
	if err != nil {
		t.Fatal(err)
	}
	if err := f.Truncate(MaxInputSize + 1); err != nil { // sparse: no 16 MiB written
		t.Fatal(err)
	}
	f.Close()
	_, _, err = Load(path)
	if !errors.Is(err, ErrRead) || !strings.Contains(err.Error(), "16 MiB") {
		t.Errorf("got %v, want an ErrRead that states the 16 MiB cap", err)
	}
}

// TestDecodeBadText checks that text no layout can hold gives an error
// with its line (issue 10, item 8: these gave "bad YAML" without a line).
func TestDecodeBadText(t *testing.T) {
	deepFlow := "arcwright: 1\ntitle:\n  title: " + strings.Repeat("[", 5000) + strings.Repeat("]", 5000) + "\n"
	var deepBlock strings.Builder
	deepBlock.WriteString("arcwright: 1\nx:\n")
	for i := range 40 {
		deepBlock.WriteString(strings.Repeat("  ", i+1) + "k:\n")
	}
	tests := []struct {
		name, text string
		line       int
		want       string
	}{
		{"Latin-1", "arcwright: 1\ntitle:\n  title: Caf\xe9\n", 3, "0xE9 is not UTF-8"},
		{"NUL", "arcwright: 1\ntitle:\n  title: a\x00b\n", 3, "NUL byte"},
		{"binary", "\x7fELF\x02\x01\x01\x00\x00", 1, "control character U+007F"},
		{"bell", "arcwright: 1\n\ntitle: a\x07b\n", 3, "U+0007"},
		{"C1 control", "arcwright: 1\ntitle: a\u0085b\n", 2, "U+0085"},
		{"deep flow", deepFlow, 3, "more than 32 levels"},
		{"deep block", deepBlock.String(), 33, "more than 32 levels"},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			es := decodeErrors(t, tt.text)
			if len(es) != 1 || es[0].Line != tt.line || !strings.Contains(es[0].Msg, tt.want) || !errors.Is(es[0], ErrSyntax) {
				t.Errorf("got %v, want one syntax error at line %d saying %q", es, tt.line, tt.want)
			}
		})
	}
	// A byte-order mark at the start is not a problem.
	mustDecode(t, "\ufeff"+baseLayout)
}

// TestSummariseLongLists checks that a file with very many problems lists
// MaxProblems of them and counts the rest in one line (issue 10, item 8).
func TestSummariseLongLists(t *testing.T) {
	text := baseLayout
	for i := range 5000 {
		text += fmt.Sprintf("unknown_%d: 1\n", i)
	}
	es := decodeErrors(t, text)
	if len(es) != MaxProblems+1 {
		t.Fatalf("got %d lines, want %d", len(es), MaxProblems+1)
	}
	if got := es.Total(); got != 5000 {
		t.Errorf("Total: got %d, want 5000", got)
	}
	last := es[len(es)-1]
	if !strings.Contains(last.Msg, "4949 more problems after this one") || !errors.Is(last, ErrUnknownKey) || last.Line != es[len(es)-2].Line+1 {
		t.Errorf("last line: got %q, want a count of the 4950 others", last)
	}
	if n := len(es.Error()); n > 16000 { // 51 lines of about 200 bytes; all 5000 would be about 1 MB
		t.Errorf("the message is %d bytes, want a short one", n)
	}
}

// TestAsBuiltSpreadsheet checks as-built files as spreadsheets save them:
// a byte-order mark, semicolons with decimal commas, tabs (issue 10, item 8).
func TestAsBuiltSpreadsheet(t *testing.T) {
	for name, text := range map[string]string{
		"BOM":        "\ufeffid,x,y,z\nA-01,5.1,7.2,1.4\n",
		"semicolons": "id;x;y;z\nA-01;5,1;7,2;1,4\n",
		"tabs":       "id\tx\ty\tz\nA-01\t5.1\t7.2\t1.4\n",
		"BOM and ;":  "\ufeffid;x_m;y_m;z_m;reasons\nA-01;5,1;7.2;1,4;too close, and more\n",
	} {
		t.Run(name, func(t *testing.T) {
			got, err := DecodeAsBuilt("built.csv", []byte(text), "m", 4)
			if err != nil {
				t.Fatal(err)
			}
			p, ok := got["A-01"]
			if !ok || !near(p.Mic.X, 5.1) || !near(p.Mic.Y, 7.2) || !near(p.Mic.Z, 1.4) {
				t.Errorf("got %v, want A-01 at 5.1, 7.2, 1.4", got)
			}
		})
	}
	if _, err := DecodeAsBuilt("built.csv", []byte("id,x,y,z\nA-01,5\xe9,7,1\n"), "m", 4); err == nil || !strings.Contains(err.Error(), "built.csv:2: column 7") {
		t.Errorf("Latin-1: got %v, want an error at line 2", err)
	}
}

// TestUnknownAsBuilt checks that every unknown station ID is reported at
// its line, with a suggestion, and a long list is summarised (issue 10,
// item 8).
func TestUnknownAsBuilt(t *testing.T) {
	path := filepath.Join(t.TempDir(), "built.csv")
	var b strings.Builder
	b.WriteString("id,x,y,z\nA-01,1,1,1\nA-1,1,1,1\n")
	for i := range 10000 {
		fmt.Fprintf(&b, "Q%d,1,1,1\n", i)
	}
	if err := os.WriteFile(path, []byte(b.String()), 0o644); err != nil {
		t.Fatal(err)
	}
	err := UnknownAsBuilt(path, []string{"A-01", "A-02"})
	var es Errors
	if !errors.As(err, &es) {
		t.Fatalf("got %v, want Errors", err)
	}
	if es[0].Line != 3 || es[0].Field != "id" || !strings.Contains(es[0].Msg, `"A-1"`) || !strings.Contains(es[0].Msg, `did you mean "A-01"`) {
		t.Errorf("first: got %q, want line 3 with a suggestion", es[0])
	}
	if es.Total() != 10001 || len(es) != MaxProblems+1 {
		t.Errorf("got %d lines for %d problems, want %d lines for 10001", len(es), es.Total(), MaxProblems+1)
	}
	if err := UnknownAsBuilt(path, nil); err == nil {
		t.Errorf("no stations: got nil, want every ID reported")
	}
}

// TestAsBuiltHeaderLine checks that a problem of the header row is
// reported at the header's line, after any comment lines (issue 10, item 8:
// every problem has a line).
func TestAsBuiltHeaderLine(t *testing.T) {
	_, err := DecodeAsBuilt("built.csv", []byte("# measured 2026-11-30\n# by A. Tester\nid,x,y\nA-01,1,2\n"), "m", 4)
	var es Errors
	if !errors.As(err, &es) || es[0].Line != 3 || es[0].Field != "z" {
		t.Errorf("got %v, want the missing z column at line 3", err)
	}
}
