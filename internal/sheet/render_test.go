package sheet_test

import (
	"bytes"
	"errors"
	"os"
	"os/exec"
	"path/filepath"
	"regexp"
	"strconv"
	"strings"
	"testing"
	"time"

	"github.com/paulmach/orb"

	"arcwright/internal/geometry"
	"arcwright/internal/jet"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
)

// render writes m to a buffer and fails the test on an error.
func render(t testing.TB, m *sheet.Model) []byte {
	t.Helper()
	var buf bytes.Buffer
	if err := m.Render(&buf); err != nil {
		t.Fatalf("Render: %v", err)
	}
	return buf.Bytes()
}

func TestRenderIsDeterministic(t *testing.T) {
	for _, tt := range []struct {
		name string
		plan func(testing.TB) *planner.Plan
	}{{"chamber", chamberPlan}, {"pad", func(t testing.TB) *planner.Plan { return padPlan(t, 120) }}} {
		t.Run(tt.name, func(t *testing.T) {
			var outs [2][]byte
			for i := range outs {
				var buf bytes.Buffer
				if err := sheet.Write(&buf, tt.plan(t), sheet.Options{}); err != nil {
					t.Fatal(err)
				}
				outs[i] = buf.Bytes()
			}
			if !bytes.Equal(outs[0], outs[1]) {
				t.Fatalf("two writes differ: %d and %d bytes", len(outs[0]), len(outs[1]))
			}
			if !bytes.HasPrefix(outs[0], []byte("%PDF-")) {
				t.Fatalf("got %q at the start, want a PDF header", outs[0][:8])
			}
		})
	}
}

// TestRenderDateFromIssueDate: the PDF's dates come from the title block,
// and without one from the fixed [sheet.Undated], never from the clock or
// the time zone (issue 10 item 17).
func TestRenderDateFromIssueDate(t *testing.T) {
	a := render(t, build(t, chamberPlan(t), sheet.Options{}))
	if !bytes.Contains(a, []byte("D:20250310000000")) {
		t.Error("got no creation date D:20250310000000 (the title block's 2025-03-10) in the PDF")
	}
	p := chamberPlan(t)
	p.Request.Title.Date = ""
	var outs [][]byte
	for _, tz := range []string{"UTC", "Pacific/Kiritimati", "Pacific/Pago_Pago"} {
		loc, err := time.LoadLocation(tz)
		if err != nil {
			loc = time.FixedZone(tz, 14*3600)
		}
		old := time.Local
		time.Local = loc
		outs = append(outs, render(t, build(t, p, sheet.Options{})))
		time.Local = old
	}
	for i := 1; i < len(outs); i++ {
		if !bytes.Equal(outs[0], outs[i]) {
			t.Fatal("an undated layout gave different PDFs in different time zones")
		}
	}
	if !bytes.Contains(outs[0], []byte("D:20000101000000")) {
		t.Error("got no creation date D:20000101000000 (sheet.Undated) in the PDF of an undated layout")
	}
}

// failWriter fails every write.
type failWriter struct{}

func (failWriter) Write([]byte) (int, error) { return 0, errors.New("disk full") }

func TestRenderWrapsWriterError(t *testing.T) {
	err := build(t, chamberPlan(t), sheet.Options{}).Render(failWriter{})
	if !errors.Is(err, sheet.ErrRender) || !strings.Contains(err.Error(), "disk full") {
		t.Fatalf("got %v, want an ErrRender carrying the writer's error", err)
	}
}

// poppler returns the path of a poppler-utils tool or skips the test.
func poppler(t *testing.T, tool string) string {
	t.Helper()
	p, err := exec.LookPath(tool)
	if err != nil {
		t.Skipf("%s (poppler-utils) is not installed: install poppler-utils to read the PDF back", tool)
	}
	return p
}

// readBack writes pdf to a file and returns pdfinfo's page count and
// pdftotext -layout's text with runs of spaces squeezed.
func readBack(t *testing.T, pdf []byte) (int, string) {
	t.Helper()
	info, text := poppler(t, "pdfinfo"), poppler(t, "pdftotext")
	path := filepath.Join(t.TempDir(), "sheet.pdf")
	if err := os.WriteFile(path, pdf, 0o644); err != nil {
		t.Fatal(err)
	}
	out, err := exec.Command(info, path).CombinedOutput()
	if err != nil {
		t.Fatalf("pdfinfo: %v\n%s", err, out)
	}
	m := regexp.MustCompile(`(?m)^Pages:\s+(\d+)`).FindSubmatch(out)
	if m == nil {
		t.Fatalf("pdfinfo gave no page count:\n%s", out)
	}
	pages, _ := strconv.Atoi(string(m[1]))
	txt, err := exec.Command(text, "-layout", path, "-").CombinedOutput()
	if err != nil {
		t.Fatalf("pdftotext: %v\n%s", err, txt)
	}
	return pages, regexp.MustCompile(`[ \t]+`).ReplaceAllString(string(txt), " ")
}

func TestReadBackWithPoppler(t *testing.T) {
	tests := []struct {
		name  string
		plan  func(testing.TB) *planner.Plan
		opt   sheet.Options
		wants []string
	}{
		{"chamber A3", chamberPlan, sheet.Options{}, []string{
			"Scale 1:50 on A3", "Model jet arc survey", "Chamber A", "MJ-2025-07", "2025-03-10", "J. Ortega",
			"sheet", "1 of 3", "3 of 3", "plan 1:50", "metric: m", "polar angle measured from the downstream jet axis",
			"5.0 m/s", "50.0 °C", "0.250 m", "conservative end of", "A-01 -> A-10: 0.813 m",
		}},
		{"chamber A4", chamberPlan, sheet.Options{Paper: "A4"}, []string{"Scale 1:100 on A4", "A4 landscape", "5 m"}},
		{"pad imperial", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }, sheet.Options{}, []string{
			`Scale 1" = 20' (1:240) on A3`, `plan 1" = 20'`, "Pad 7 engine noise survey", "EN-41", "feet and inches", "polar angle measured from the inlet",
			"16.4 ft/s", "122.0 °F", "open sky", "50 ft",
		}},
	}
	cautions := []string{"WARNING", "can kill or seriously injure", "HOT-EXHAUST AND HIGH-VELOCITY ZONES", "MEAN flow", "hearing protection",
		"Keep out of the cell", "safety procedures, local codes and licensed practice"}
	for _, tt := range tests {
		t.Run(tt.name, func(t *testing.T) {
			p := tt.plan(t)
			m := build(t, p, tt.opt)
			pages, text := readBack(t, render(t, m))
			if pages != len(m.Pages) {
				t.Errorf("got %d pages from pdfinfo, want %d as in the model", pages, len(m.Pages))
			}
			for _, s := range p.Stations {
				if !strings.Contains(text, s.ID) {
					t.Errorf("station %s is not in the PDF text", s.ID)
				}
			}
			for _, w := range append(cautions, tt.wants...) {
				if !strings.Contains(text, w) {
					t.Errorf("%q is not in the PDF text", w)
				}
			}
			if !strings.Contains(text, m.ScaleBar.Label) {
				t.Errorf("the scale bar's label %q is not in the PDF text", m.ScaleBar.Label)
			}
			if !strings.Contains(text, "1:"+strconv.Itoa(m.Scale)) {
				t.Errorf("the scale 1:%d is not stated in the PDF text", m.Scale)
			}
			// the cautions are on the first page
			first := strings.SplitN(text, "\f", 2)[0]
			if !strings.Contains(first, "WARNING") || !strings.Contains(first, "hearing protection") {
				t.Error("the cautions are not on the first page")
			}
		})
	}
}

// TestSignalWordPanel: sheet 1's safety panel carries the signal word of
// the hazard's level with that level's colour and the safety alert symbol:
// hot high-velocity exhaust could kill or seriously injure, which is
// WARNING on safety orange in ANSI Z535.4-2007 §4.14.2 and ISO 3864-2
// (READ in a label maker's summary of both standards), not a red CAUTION
// (issue 9 item 6).
func TestSignalWordPanel(t *testing.T) {
	m := build(t, chamberPlan(t), sheet.Options{})
	pg := m.Pages[0]
	var word, hazard bool
	for _, tx := range pg.Texts {
		if tx.Text == "WARNING" && tx.Bold && tx.Color == sheet.Black {
			word = true
		}
		if strings.Contains(tx.Text, "can kill or seriously injure") {
			hazard = true
		}
		if strings.Contains(tx.Text, "CAUTION") || strings.Contains(tx.Text, "DANGER") {
			t.Errorf("sheet 1 says %q: the level of this hazard is WARNING", tx.Text)
		}
	}
	if !word || !hazard {
		t.Errorf("got signal word %v and hazard statement %v, want both", word, hazard)
	}
	band := false
	for _, sh := range pg.Shapes {
		if sh.Style == sheet.StyleSignal {
			band = true
		}
	}
	if !band {
		t.Error("no signal-word band on sheet 1")
	}
	d, _ := sheet.StyleSignal.Def()
	if c := d.Fill; c == nil || !(c[0] > 200 && c[1] > 80 && c[1] < 160 && c[2] < 60) {
		t.Errorf("got signal band fill %v, want safety orange", d.Fill)
	}
}

// TestWarningsOnSheetOne: the plan's warnings are on sheet 1, and the
// places where a drawn zone meets a surface (a wall jet) or buoyancy bends
// the jet are marked on the plan with a triangle and words (issue 9 item 6:
// they were only in small print on the last sheet).
func TestWarningsOnSheetOne(t *testing.T) {
	for _, tt := range []struct {
		name string
		plan func(testing.TB) *planner.Plan
	}{{"chamber", chamberPlan}, {"pad", func(t testing.TB) *planner.Plan { return padPlan(t, 60) }}} {
		t.Run(tt.name, func(t *testing.T) {
			p := tt.plan(t)
			p.Warnings = append(p.Warnings, "P: the velocity zone reaches the floor about 9 m downstream of the exit: the exhaust spreads along it there as a wall jet")
			// the sheet marks what the planner reports where it reports it
			at := p.Request.Exit.ToCell(geometry.JetPoint{X: 9})
			p.Impingements = append(p.Impingements, planner.Impingement{Point: "P", Zone: jet.VelocityZone, Surface: planner.SurfaceFloor, X: 9, At: orb.Point{at.X, at.Y}})
			m := build(t, p, sheet.Options{})
			pg := m.Pages[0]
			var words []string
			for _, tx := range pg.Texts {
				words = append(words, tx.Text)
			}
			text := strings.Join(strings.Fields(strings.Join(words, " ")), " ")
			if !strings.Contains(text, "WARNINGS FROM THE PLAN") {
				t.Fatal("sheet 1 has no warnings panel")
			}
			if !strings.Contains(text, "P: the velocity zone reaches the floor") || !strings.Contains(text, "wall jet there") {
				t.Error("the wall-jet warning is not on sheet 1")
			}
			marks := 0
			for _, v := range pg.Views {
				for _, sh := range v.Shapes {
					if sh.Style == sheet.StyleHazard {
						marks++
					}
				}
			}
			labels := 0
			for _, l := range pg.Labels {
				if l.For == "warning" && strings.Contains(l.Text, "wall jet") {
					labels++
				}
			}
			if marks == 0 || labels == 0 {
				t.Errorf("got %d warning triangles and %d wall-jet labels on the plan, want some of each", marks, labels)
			}
		})
	}
}
