package main

import (
	"os"
	"path/filepath"
	"strings"
	"testing"
)

// TestPlanSheetFlags: a bad --paper or --scale is refused before any work
// (the layout is not even read: a missing one would be exit 1), exit 2, in
// the user's words; nothing is written (issue 9, issue 10 item 10).
func TestPlanSheetFlags(t *testing.T) {
	dir := t.TempDir()
	pdf := filepath.Join(dir, "s.pdf")
	missing := filepath.Join(dir, "no-such-layout.yaml")
	tests := []struct {
		name string
		args []string
		want []string
	}{
		{"unknown paper", []string{"plan", missing, "--pdf", pdf, "--paper", "A5"}, []string{`--paper "A5"`, "A0", "ANSI D", "Arch D"}},
		{"odd scale", []string{"plan", missing, "--pdf", pdf, "--scale", "1:7"}, []string{`--scale "1:7"`, "not a standard scale", "1:75", `1" = 10'`}},
		{"not a scale", []string{"plan", missing, "--pdf", pdf, "--scale", "big"}, []string{`--scale "big"`}},
		{"paper without a sheet", []string{"plan", missing, "--paper", "A1"}, []string{"--paper", "give --pdf"}},
		{"scale without a sheet", []string{"plan", missing, "--scale", "1:50"}, []string{"--scale", "give --pdf"}},
	}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			_, errOut, code := arc(t, tt.args...)
			if code != exitUsage {
				t.Errorf("got exit %d, want %d; stderr %q", code, exitUsage, errOut)
			}
			for _, w := range tt.want {
				if !strings.Contains(errOut, w) {
					t.Errorf("stderr %q lacks %q", errOut, w)
				}
			}
			for _, internal := range []string{"Options.", "Request.", "sheet:"} {
				if strings.Contains(errOut, internal) {
					t.Errorf("stderr %q names the internal %q", errOut, internal)
				}
			}
			if _, err := os.Stat(pdf); err == nil {
				t.Error("a PDF was written")
			}
		})
	}
	// the new papers and the feet-and-inches scales are accepted
	for _, args := range [][]string{
		{"--paper", "A0"}, {"--paper", "ANSI D", "--scale", "1:75"}, {"--paper", "arch-d"},
		{"--paper", "Tabloid", "--scale", `1" = 20'`},
	} {
		a := append([]string{"plan", filepath.Join(demoDir, "hard-wall-exhaust-room.yaml"), "--pdf", pdf}, args...)
		if _, errOut, code := arc(t, a...); code != exitOK {
			t.Errorf("%v: got exit %d, want 0; stderr %q", args, code, errOut)
		}
	}
}

// TestLargeSite plans the large outdoor site of issue 9 (600 × 400 m, ten
// arcs of 200 stations, 200 obstacles): at 1:5000 it panicked in the sheet,
// and without a scale it was refused on A3 with no way out. Every way of
// asking now gives a sheet.
func TestLargeSite(t *testing.T) {
	pdf := filepath.Join(t.TempDir(), "s.pdf")
	for _, args := range [][]string{{"--scale", "1:5000"}, {"--paper", "A1"}} {
		a := append([]string{"plan", filepath.Join("testdata", "large-site.yaml"), "--pdf", pdf}, args...)
		if _, errOut, code := arc(t, a...); code != exitOK {
			t.Errorf("%v: got exit %d, want 0; stderr %q", args, code, errOut)
		}
	}
	// a scale too large for the paper names the scale and the paper that fit
	_, errOut, code := arc(t, "plan", filepath.Join("testdata", "large-site.yaml"), "--pdf", pdf, "--paper", "A4", "--scale", "1:500")
	if code != exitError || !strings.Contains(errOut, "fits on A4") || !strings.Contains(errOut, "A1 paper holds it at 1:500") {
		t.Errorf("got exit %d, stderr %q; want exit 1 naming the scale and the paper that fit", code, errOut)
	}
}
