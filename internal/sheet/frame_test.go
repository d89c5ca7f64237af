package sheet_test

import (
	"errors"
	"path/filepath"
	"strings"
	"testing"

	"arcwright/internal/sheet"
)

// frameLayouts returns the demo layouts and the reviewers' layouts in
// testdata.
func frameLayouts(t *testing.T) []string {
	t.Helper()
	demos, err := filepath.Glob("../../layouts/*.yaml")
	if err != nil || len(demos) == 0 {
		t.Fatalf("no demo layouts: %v", err)
	}
	own, err := filepath.Glob("testdata/review-*.yaml")
	if err != nil || len(own) == 0 {
		t.Fatalf("no review layouts: %v", err)
	}
	return append(demos, own...)
}

// framePapers are the sheet sizes the frame test draws on: the smallest
// metric and US sheets, a middle one, and the largest of each series.
var framePapers = []string{"A4", "Letter", "A3", "A0", "ANSI E", "Arch D"}

// eachSheetSet builds the sheet set of every demo and review layout on
// each of framePapers and calls f with it. A layout whose plan fits the
// paper at no scale is skipped (that is an error the user sees, tested in
// fit_test.go).
func eachSheetSet(t *testing.T, f func(t *testing.T, m *sheet.Model)) {
	for _, path := range frameLayouts(t) {
		p := demoPlan(t, path)
		for _, paper := range framePapers {
			name := strings.TrimSuffix(filepath.Base(path), ".yaml") + "/" + paper
			t.Run(name, func(t *testing.T) {
				m, err := sheet.Build(p, sheet.Options{Paper: paper})
				if errors.Is(err, sheet.ErrScale) {
					return
				}
				if err != nil {
					t.Fatalf("Build: %v", err)
				}
				f(t, m)
			})
		}
	}
}

// TestEverythingInsideTheFrame: on every sheet of every demo and review
// layout, on small and large paper, every text line, panel and table (its
// title, its columns and each line of each cell) lies inside the drawing
// border, and every label inside its view's frame.
func TestEverythingInsideTheFrame(t *testing.T) {
	const tol = 0.05 // mm
	eachSheetSet(t, func(t *testing.T, m *sheet.Model) {
		for _, pg := range m.Pages {
			fr := pg.Frame
			out := func(x0, x1 float64) bool { return x0 < fr.X-tol || x1 > fr.Right()+tol }
			for _, tx := range pg.Texts {
				for _, ln := range strings.Split(tx.Text, "\n") {
					w := sheet.TextWidth(sheet.Text{Text: ln, Size: tx.Size, Bold: tx.Bold})
					if out(tx.X, tx.X+w) || tx.Y < fr.Y-tol || tx.Y > fr.Bottom()+tol {
						t.Errorf("sheet %d: text %q spans x %.1f to %.1f at y %.1f, outside the frame %v", pg.Number, ln, tx.X, tx.X+w, tx.Y, fr)
					}
				}
			}
			for _, pn := range pg.Panels {
				if !fr.Contains(pn.Box) {
					t.Errorf("sheet %d: panel %s at %v leaves the frame %v", pg.Number, pn.Name, pn.Box, fr)
				}
			}
			views := map[string]sheet.Rect{}
			for _, v := range pg.Views {
				views[v.Name] = v.Frame
			}
			for _, l := range pg.Labels {
				box, ok := views[l.View]
				if !ok {
					box = fr
				}
				if !box.Contains(l.Box()) {
					t.Errorf("sheet %d: label %q at %v leaves its frame %v", pg.Number, l.Text, l.Box(), box)
				}
			}
			for _, tb := range pg.Tables {
				if out(tb.X, tb.X+tb.W()) || tb.Y < fr.Y-tol || tb.Y+tb.H() > fr.Bottom()+tol {
					t.Errorf("sheet %d: table %s spans x %.1f to %.1f, y %.1f to %.1f, outside the frame %v", pg.Number, tb.Name, tb.X, tb.X+tb.W(), tb.Y, tb.Y+tb.H(), fr)
				}
				for _, ln := range strings.Split(tb.Title, "\n") {
					if w := sheet.TextWidth(sheet.Text{Text: ln, Size: sheet.SizeBody, Bold: true}); out(tb.X, tb.X+w) {
						t.Errorf("sheet %d: table %s: title line %q spans x %.1f to %.1f, outside the frame %v", pg.Number, tb.Name, ln, tb.X, tb.X+w, fr)
					}
				}
				for ci, c := range tb.Columns {
					check := func(what string, lines []string, bold bool) {
						for _, ln := range lines {
							if w := sheet.TextWidth(sheet.Text{Text: ln, Size: tb.Size, Bold: bold}); w > c.W+tol {
								t.Errorf("sheet %d: table %s column %d: %s %q is %.1f mm wide, its column %.1f mm", pg.Number, tb.Name, ci+1, what, ln, w, c.W)
							}
						}
					}
					check("heading", c.Heading, true)
					for _, r := range tb.Rows {
						if ci < len(r.Cells) {
							check("cell", r.Cells[ci], false)
						}
					}
				}
			}
		}
	})
}

// TestEveryDetailIsCalledOut: every detail view has its callout, the
// outline's letter "DETAIL X", on the plan, and so a station shown in two
// details is shown in two views the plan calls out.
func TestEveryDetailIsCalledOut(t *testing.T) {
	eachSheetSet(t, func(t *testing.T, m *sheet.Model) {
		called := map[string]bool{}
		for _, l := range m.Pages[0].Labels {
			if strings.HasPrefix(l.For, "detail ") {
				called[l.For] = true
			}
		}
		for _, pg := range m.Pages[1:] {
			for _, v := range pg.Views {
				if strings.HasPrefix(v.Name, "detail ") && !called[v.Name] {
					t.Errorf("sheet %d: %s has no callout on the plan", pg.Number, v.Name)
				}
			}
		}
	})
}
