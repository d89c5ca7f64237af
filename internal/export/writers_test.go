package export_test

import (
	"bytes"
	"errors"
	"io"
	"testing"

	"arcwright/internal/export"
	"arcwright/internal/planner"
)

// errWriter fails every write.
type errWriter struct{}

var errDiskFull = errors.New("disk full")

func (errWriter) Write([]byte) (int, error) { return 0, errDiskFull }

// TestWriteErrors checks the errors of all three writers: bad plans wrap
// the package's sentinels, and a failing writer's error is wrapped.
func TestWriteErrors(t *testing.T) {
	writers := []struct {
		name  string
		write func(w io.Writer, p *planner.Plan) error
	}{
		{"JSON", func(w io.Writer, p *planner.Plan) error { return export.JSON(w, p) }},
		{"CSV", func(w io.Writer, p *planner.Plan) error { return export.CSV(w, p) }},
		{"GeoJSON", func(w io.Writer, p *planner.Plan) error { return export.GeoJSON(w, p) }},
	}
	cases := []struct {
		name   string
		change func(p *planner.Plan) *planner.Plan
		w      io.Writer
		want   error
	}{
		{"nil plan", func(*planner.Plan) *planner.Plan { return nil }, &bytes.Buffer{}, export.ErrNoPlan},
		{"nil request", func(p *planner.Plan) *planner.Plan { p.Request = nil; return p }, &bytes.Buffer{}, export.ErrNoPlan},
		{"no convention", func(p *planner.Plan) *planner.Plan { p.Request.Convention = 0; return p }, &bytes.Buffer{}, export.ErrInvalidPlan},
		{"governing out of range", func(p *planner.Plan) *planner.Plan { p.Governing = len(p.Points); return p }, &bytes.Buffer{}, export.ErrInvalidPlan},
		{"status unset", func(p *planner.Plan) *planner.Plan { p.Stations[2].Status = 0; return p }, &bytes.Buffer{}, export.ErrInvalidPlan},
		{"check verdict unknown", func(p *planner.Plan) *planner.Plan { p.Stations[0].Checks[1].Verdict = 9; return p }, &bytes.Buffer{}, export.ErrInvalidPlan},
		{"failing writer", func(p *planner.Plan) *planner.Plan { return p }, errWriter{}, errDiskFull},
	}
	for _, w := range writers {
		for _, c := range cases {
			t.Run(w.name+"/"+c.name, func(t *testing.T) {
				err := w.write(c.w, c.change(fixturePlan(t)))
				if !errors.Is(err, c.want) {
					t.Errorf("got error %v, want one wrapping %v", err, c.want)
				}
			})
		}
	}
}

// TestDeterministic writes each format twice and compares the bytes.
func TestDeterministic(t *testing.T) {
	for _, w := range []struct {
		name  string
		write func(w io.Writer, p *planner.Plan) error
	}{
		{"JSON", func(w io.Writer, p *planner.Plan) error { return export.JSON(w, p) }},
		{"CSV", func(w io.Writer, p *planner.Plan) error { return export.CSV(w, p) }},
		{"GeoJSON", func(w io.Writer, p *planner.Plan) error { return export.GeoJSON(w, p) }},
	} {
		t.Run(w.name, func(t *testing.T) {
			var a, b bytes.Buffer
			if err := w.write(&a, fixturePlan(t)); err != nil {
				t.Fatal(err)
			}
			for i := 0; i < 5; i++ {
				b.Reset()
				if err := w.write(&b, fixturePlan(t)); err != nil {
					t.Fatal(err)
				}
				if !bytes.Equal(a.Bytes(), b.Bytes()) {
					t.Fatalf("run %d: got %d different bytes, want the same output every time", i+2, b.Len())
				}
			}
		})
	}
}
