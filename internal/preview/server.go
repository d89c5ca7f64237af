package preview

import (
	"bytes"
	"errors"
	"fmt"
	"sync"

	"arcwright/internal/export"
	"arcwright/internal/layout"
	"arcwright/internal/planner"
	"arcwright/internal/sheet"
	"arcwright/internal/units"
)

// Problem is one problem that stops the layout being planned, as the page
// and /plan.json show it. Line is 0 and Key empty when the problem has no
// place in the file.
type Problem struct {
	File    string `json:"file"`
	Line    int    `json:"line"`
	Key     string `json:"key"`
	Message string `json:"message"`
}

// snapshot is what the server serves at one moment: the last good plan's
// outputs and, while the file is bad, its problems.
type snapshot struct {
	version  int       // counts the changes of the plan or of the problems, from 1
	problems []Problem // nil when the current file plans
	good     bool      // a plan was made (now or before)
	plan     *planner.Plan
	json     []byte // the plan as JSON
	svg      []byte // the plan view
	units    units.System
	pdf      *pdfCache // the sheet, rendered on the first request
}

// pdfCache holds a plan's sheet once rendered.
type pdfCache struct {
	once sync.Once
	data []byte
	err  error
}

// current reports whether the snapshot's plan is of the file as it is now.
func (s *snapshot) current() bool { return s.good && s.problems == nil }

// Server plans one layout file and serves the result; see the package
// documentation. Its methods are safe for concurrent use.
type Server struct {
	path string

	mu     sync.RWMutex
	snap   *snapshot
	subs   map[chan int]struct{}
	closed chan struct{}
	once   sync.Once

	reloadMu sync.Mutex // one re-plan at a time
	planned  fileStamp  // the file as the last re-plan found it, under reloadMu
}

// New returns a server for the layout file at path and plans it once. The
// sheet's paper and scale are the layout's. A file that does not plan is not
// an error here: the server serves its problems until the file is fixed.
func New(path string) *Server {
	s := &Server{path: path, subs: make(map[chan int]struct{}), closed: make(chan struct{}), snap: &snapshot{}}
	s.Reload()
	return s
}

// Path returns the layout file the server serves.
func (s *Server) Path() string { return s.path }

// Close ends the event streams, so that an http.Server serving s can shut
// down; the other endpoints keep answering.
func (s *Server) Close() { s.once.Do(func() { close(s.closed) }) }

// Reload plans the file again and reports whether what is served changed
// (a new plan, or new problems); each change is announced on /events.
func (s *Server) Reload() bool {
	s.reloadMu.Lock()
	defer s.reloadMu.Unlock()
	s.planned = stamp(s.path)
	next := s.plan()
	s.mu.Lock()
	prev := s.snap
	if next.good == prev.good && bytes.Equal(next.json, prev.json) && bytes.Equal(next.svg, prev.svg) && sameProblems(next.problems, prev.problems) && next.units == prev.units {
		s.mu.Unlock()
		return false
	}
	if !next.good && prev.good {
		// keep the last good drawing to show beside the problems
		next.good, next.plan, next.json, next.svg, next.units = true, prev.plan, prev.json, prev.svg, prev.units
		next.pdf = prev.pdf
	}
	next.version = prev.version + 1
	s.snap = next
	for ch := range s.subs {
		select {
		case ch <- next.version:
		default: // the stream has an event waiting; it reads the newest
		}
	}
	s.mu.Unlock()
	return true
}

// plannedStamp returns the file's size and time as the last re-plan found
// them, before it read the file.
func (s *Server) plannedStamp() fileStamp {
	s.reloadMu.Lock()
	defer s.reloadMu.Unlock()
	return s.planned
}

// plan reads and plans the file and renders its outputs.
func (s *Server) plan() *snapshot {
	req, _, err := layout.Load(s.path)
	if err != nil {
		return &snapshot{problems: s.problems(err)}
	}
	// the planner's, the sheet's and the export's errors are placed at
	// the layout's line and key by layout.Locate
	p, err := planner.New(req)
	if err != nil {
		return &snapshot{problems: s.problems(layout.Locate(req, err))}
	}
	// the JSON and the drawing at once: they only read the plan
	var js, svg bytes.Buffer
	jsErr := make(chan error, 1)
	go func() { jsErr <- export.JSON(&js, p) }()
	d, err := sheet.PlanView(p, sheet.Options{})
	if err == nil {
		err = d.WriteSVG(&svg)
	}
	if e := <-jsErr; e != nil {
		err = e
	}
	if err != nil {
		return &snapshot{problems: s.problems(layout.Locate(req, err))}
	}
	return &snapshot{good: true, plan: p, json: js.Bytes(), svg: svg.Bytes(), units: req.System(), pdf: new(pdfCache)}
}

// problems turns err into the problems to show: each of a layout's
// errors with its line and key, or one problem of the whole file.
func (s *Server) problems(err error) []Problem {
	var le layout.Errors
	if errors.As(err, &le) {
		out := make([]Problem, len(le))
		for i, e := range le {
			out[i] = Problem{File: e.File, Line: e.Line, Key: e.Field, Message: e.Msg}
		}
		return out
	}
	var one *layout.Error
	if errors.As(err, &one) {
		return []Problem{{File: one.File, Line: one.Line, Key: one.Field, Message: one.Msg}}
	}
	return []Problem{{File: s.path, Message: err.Error()}}
}

func sameProblems(a, b []Problem) bool {
	if (a == nil) != (b == nil) || len(a) != len(b) {
		return false
	}
	for i := range a {
		if a[i] != b[i] {
			return false
		}
	}
	return true
}

// snapshot returns what is served now.
func (s *Server) snapshot() *snapshot {
	s.mu.RLock()
	defer s.mu.RUnlock()
	return s.snap
}

// Problems returns the problems that stop the file as it is now from
// planning, nil when it plans.
func (s *Server) Problems() []Problem {
	return append([]Problem(nil), s.snapshot().problems...)
}

// Version returns the number of changes of what is served, from 1 after
// the first plan.
func (s *Server) Version() int { return s.snapshot().version }

// sheetPDF renders the snapshot's sheet once and keeps it.
func (s *Server) sheetPDF(sn *snapshot) ([]byte, error) {
	c := sn.pdf
	c.once.Do(func() {
		var b bytes.Buffer
		if err := sheet.Write(&b, sn.plan, sheet.Options{}); err != nil {
			c.err = fmt.Errorf("%s: %w", s.path, err)
			return
		}
		c.data = b.Bytes()
	})
	return c.data, c.err
}

// subscribe returns a channel that receives the version after each change.
func (s *Server) subscribe() chan int {
	ch := make(chan int, 1)
	s.mu.Lock()
	s.subs[ch] = struct{}{}
	s.mu.Unlock()
	return ch
}

func (s *Server) unsubscribe(ch chan int) {
	s.mu.Lock()
	delete(s.subs, ch)
	s.mu.Unlock()
}
