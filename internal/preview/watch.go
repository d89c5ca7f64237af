package preview

import (
	"context"
	"fmt"
	"os"
	"path/filepath"
	"time"

	"github.com/fsnotify/fsnotify"
)

// Watch timings.
const (
	// settle is how long the file must be quiet after a change before it
	// is planned again: an editor's truncate-then-write or
	// write-then-rename is one change, not two.
	settle = 40 * time.Millisecond
	// poll is how often the file's size and time are compared as well,
	// for file systems that send no events.
	poll = 2 * time.Second
	// pollOnly is how often they are compared when the folder cannot be
	// watched at all (no folder yet, or the system's watches used up).
	pollOnly = 250 * time.Millisecond
)

// Watch re-plans the file each time it changes until ctx is done, and
// returns ctx's error then. It watches the file's directory, not the file,
// and picks the events by name: an editor that saves by writing a new file
// and renaming it over the old one replaces the file a watch on the file
// itself would follow. When the folder cannot be watched (it does not
// exist yet, or the system has no watches left), Watch falls back to
// comparing the file's size and modification time four times a second.
func (s *Server) Watch(ctx context.Context) error {
	abs, err := filepath.Abs(s.path)
	if err != nil {
		return fmt.Errorf("preview: watching %s: %w", s.path, err)
	}
	dir, name := filepath.Split(abs)
	var events <-chan fsnotify.Event
	var errs <-chan error
	every := pollOnly
	if w, err := fsnotify.NewWatcher(); err == nil {
		defer w.Close()
		if err := w.Add(dir); err == nil {
			events, errs, every = w.Events, w.Errors, poll
		}
	}
	timer := time.NewTimer(time.Hour)
	timer.Stop()
	tick := time.NewTicker(every)
	defer tick.Stop()
	last := stamp(abs)
	if last != s.plannedStamp() {
		// changed between the last plan and the watch's start
		timer.Reset(0)
	}
	for {
		select {
		case <-ctx.Done():
			return ctx.Err()
		case ev, ok := <-events:
			if !ok {
				events = nil
				continue
			}
			if filepath.Base(ev.Name) == name {
				timer.Reset(settle)
			}
		case _, ok := <-errs:
			if !ok {
				errs = nil
				continue
			}
			// an overflowed queue loses events: plan again to be sure
			timer.Reset(settle)
		case <-tick.C:
			if st := stamp(abs); st != last {
				timer.Reset(settle)
			}
		case <-timer.C:
			s.Reload()
			last = s.plannedStamp()
		}
	}
}

// fileStamp is what tells one version of a file from another without
// reading it.
type fileStamp struct {
	size int64
	mod  time.Time
	ok   bool
}

func stamp(path string) fileStamp {
	fi, err := os.Stat(path)
	if err != nil {
		return fileStamp{}
	}
	return fileStamp{size: fi.Size(), mod: fi.ModTime(), ok: true}
}
