package main

import (
	"bytes"
	"os"
	"os/exec"
	"path/filepath"
	"strconv"
	"strings"
	"testing"

	"arcwright/internal/sheet"
)

// TestDemoSheets writes the sheet of every demo layout and reads it back
// with an independent reader (pdftotext from poppler-utils, which .ci/run
// installs): every station ID, the cautions, the title and the scale must
// be in the text, and the page count must match pdfinfo's.
func TestDemoSheets(t *testing.T) {
	if _, err := exec.LookPath("pdftotext"); err != nil {
		t.Skip("pdftotext (poppler-utils) is not installed; .ci/run installs it")
	}
	for _, d := range demos {
		t.Run(d, func(t *testing.T) {
			p, err := loadPlan(filepath.Join(demoDir, d+".yaml"), "", "")
			if err != nil {
				t.Fatal(err)
			}
			m, err := sheet.Build(p, sheet.Options{})
			if err != nil {
				t.Fatal(err)
			}
			var b bytes.Buffer
			if err := m.Render(&b); err != nil {
				t.Fatal(err)
			}
			pdf := filepath.Join(t.TempDir(), d+".pdf")
			if err := os.WriteFile(pdf, b.Bytes(), 0o644); err != nil {
				t.Fatal(err)
			}
			text, err := exec.Command("pdftotext", "-layout", pdf, "-").Output()
			if err != nil {
				t.Fatal(err)
			}
			s := string(text)
			for _, st := range p.Stations {
				if !strings.Contains(s, st.ID) {
					t.Errorf("station %s not on the sheet", st.ID)
				}
			}
			for _, want := range []string{"WARNING", "hearing protection", "safety procedures", p.Request.Title.Title, p.Request.Title.Facility, "1:"} {
				if !strings.Contains(s, want) {
					t.Errorf("sheet lacks %q", want)
				}
			}
			info, err := exec.Command("pdfinfo", pdf).Output()
			if err != nil {
				t.Fatal(err)
			}
			if want := "Pages:"; !strings.Contains(string(info), want) || !strings.Contains(string(info), " "+strconv.Itoa(len(m.Pages))+"\n") {
				t.Errorf("pdfinfo pages differ from the model's %d:\n%s", len(m.Pages), info)
			}
		})
	}
}
