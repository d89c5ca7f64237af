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
)

// Watch re-plans the file each time it changes until ctx is done, and
// returns ctx's error then. It watches the file's directory, not the file,
// and picks the events by name: an editor that saves by writing a new file
// and renaming it over the old one replaces the file a watch on the file
// itself would follow. It returns an error at once when the directory
// cannot be watched.
func (s *Server) Watch(ctx context.Context) error {
	w, err := fsnotify.NewWatcher()
	if err != nil {
		return fmt.Errorf("preview: watching %s: %w", s.path, err)
	}
	defer w.Close()
	abs, err := filepath.Abs(s.path)
	if err != nil {
		return fmt.Errorf("preview: watching %s: %w", s.path, err)
	}
	dir, name := filepath.Split(abs)
	if err := w.Add(dir); err != nil {
		return fmt.Errorf("preview: watching the folder of %s: %w", s.path, err)
	}
	// a change between the first plan and the watch's start
	s.Reload()
	timer := time.NewTimer(time.Hour)
	timer.Stop()
	tick := time.NewTicker(poll)
	defer tick.Stop()
	last := stamp(abs)
	for {
		select {
		case <-ctx.Done():
			return ctx.Err()
		case ev, ok := <-w.Events:
			if !ok {
				return ctx.Err()
			}
			if filepath.Base(ev.Name) == name {
				timer.Reset(settle)
			}
		case _, ok := <-w.Errors:
			if !ok {
				return ctx.Err()
			}
			// an overflowed queue loses events: plan again to be sure
			timer.Reset(settle)
		case <-tick.C:
			if st := stamp(abs); st != last {
				timer.Reset(settle)
			}
		case <-timer.C:
			last = stamp(abs)
			s.Reload()
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
