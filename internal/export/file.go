package export

import (
	"bufio"
	"errors"
	"fmt"
	"io"
	"io/fs"
	"os"
	"os/signal"
	"path/filepath"
	"sync"
	"syscall"
)

// fileMode is the permission of a new file that WriteFile or WriteFiles
// writes; a file that is replaced keeps its own.
const fileMode = 0o644

// Stdout is the destination that means standard output.
const Stdout = "-"

// maxLinks is how many symbolic links a destination may go through.
const maxLinks = 40

// Output is one file of a run: a label for messages (a flag such as
// "--csv"), its destination and the function that writes its content.
type Output struct {
	Label string
	Path  string
	Write func(io.Writer) error
}

// Input is a file a run reads, with a label for messages ("the layout").
type Input struct {
	Label string
	Path  string
}

// kinds of destination
const (
	toFile    = iota // a regular file, new or replaced atomically
	toStdout         // "-"
	toDiscard        // the null device: nothing is written
	toPipe           // a named pipe: written through
)

// destination is a checked output path.
type destination struct {
	Output
	kind   int
	target string      // the path written (links followed), for toFile and toPipe
	mode   fs.FileMode // permission of the file written
	info   fs.FileInfo // of the existing target, nil if none
}

// CheckOutputs checks, before any work, that every output can be written
// and that none would overwrite an input or another output. Paths are
// compared after following symbolic links, and existing files also by
// identity (hard links). A destination may be:
//
//   - a regular file, or a name that does not exist yet in an existing
//     directory that can be written: the file is written atomically, and an
//     existing file keeps its permissions;
//   - a symbolic link (or a chain of them), even one whose target does not
//     exist yet: the target is written, and the link stays;
//   - "-" ([Stdout]): standard output, at most one output;
//   - the null device (os.DevNull): nothing is written;
//   - a pipe (a named pipe, or /dev/fd/N of a shell's process
//     substitution): written through, after every file is in place. It is
//     opened without waiting, before any file is put in place: a pipe that
//     no process reads gives an error wrapping [ErrNoReader] at once, and
//     nothing is written.
//
// A directory, a device other than the null device, or a socket is
// refused with an error wrapping [ErrNotRegular]. A path that is an input
// or another output gives an error wrapping [ErrSamePath]; an empty path
// gives [ErrNoPath].
func CheckOutputs(outs []Output, ins []Input) error {
	_, err := checkAll(outs, ins)
	return err
}

// checkAll does the work of CheckOutputs and returns the destinations.
func checkAll(outs []Output, ins []Input) ([]destination, error) {
	dests := make([]destination, 0, len(outs))
	for _, o := range outs {
		d, err := resolve(o)
		if err != nil {
			return nil, err
		}
		if d.kind == toFile {
			if err := probeDir(filepath.Dir(d.target)); err != nil {
				return nil, fmt.Errorf("%s %s: cannot write in its directory: %w", o.Label, o.Path, err)
			}
		}
		dests = append(dests, d)
	}
	for i, d := range dests {
		if d.kind == toDiscard {
			continue
		}
		for _, in := range ins {
			if same(d, in.Path) {
				return nil, destError(ErrSamePath, "%s %s is %s %s; writing it would destroy the input", d.Label, d.Path, in.Label, in.Path)
			}
		}
		for _, e := range dests[:i] {
			if e.kind == d.kind && (d.kind == toStdout || sameDest(d, e)) {
				return nil, destError(ErrSamePath, "%s %s and %s %s are the same file; give each output its own", e.Label, e.Path, d.Label, d.Path)
			}
		}
	}
	return dests, nil
}

// destinationError is a refused destination: its message, in the words of
// the command line, and the sentinel it wraps.
type destinationError struct {
	msg  string
	kind error
}

func (e *destinationError) Error() string { return e.msg }
func (e *destinationError) Unwrap() error { return e.kind }

func destError(kind error, format string, args ...any) error {
	return &destinationError{msg: fmt.Sprintf(format, args...), kind: kind}
}

// resolve classifies the destination of o, following symbolic links.
func resolve(o Output) (destination, error) {
	d := destination{Output: o, kind: toFile, mode: fileMode}
	if o.Path == "" {
		return d, fmt.Errorf("%w for %s", ErrNoPath, o.Label)
	}
	if o.Path == Stdout {
		d.kind = toStdout
		return d, nil
	}
	// a pipe, named or anonymous (a shell's process substitution gives
	// /dev/fd/N, whose link text is not a path): written through
	if fi, err := os.Stat(o.Path); err == nil && fi.Mode()&fs.ModeNamedPipe != 0 {
		d.kind, d.target, d.info = toPipe, o.Path, fi
		return d, nil
	}
	p := o.Path
	for range maxLinks {
		fi, err := os.Lstat(p)
		switch {
		case errors.Is(err, fs.ErrNotExist):
			d.target = p
			return d, nil
		case err != nil:
			return d, fmt.Errorf("%s %s: %w", o.Label, o.Path, err)
		case fi.Mode()&fs.ModeSymlink != 0:
			link, err := os.Readlink(p)
			if err != nil {
				return d, fmt.Errorf("%s %s: %w", o.Label, o.Path, err)
			}
			if !filepath.IsAbs(link) {
				link = filepath.Join(filepath.Dir(p), link)
			}
			p = link
			continue
		}
		d.target, d.info = p, fi
		switch m := fi.Mode(); {
		case m.IsRegular():
			d.mode = m.Perm()
		case m&fs.ModeNamedPipe != 0:
			d.kind = toPipe
		case isNullDevice(fi):
			d.kind = toDiscard
		case m.IsDir():
			return d, destError(ErrNotRegular, "%s %s is a directory; give a file name", o.Label, o.Path)
		default:
			return d, destError(ErrNotRegular, "%s %s is a device or a socket, not a file; give a file name, or - for standard output", o.Label, o.Path)
		}
		return d, nil
	}
	return d, destError(ErrNotRegular, "%s %s goes through more than %d symbolic links", o.Label, o.Path, maxLinks)
}

// isNullDevice reports whether fi is the null device.
func isNullDevice(fi fs.FileInfo) bool {
	null, err := os.Stat(os.DevNull)
	return err == nil && os.SameFile(fi, null)
}

// probeDir checks that a file can be created in dir, by creating and
// removing an empty temporary one.
func probeDir(dir string) error {
	f, err := os.CreateTemp(dir, ".arcwright-probe-*")
	if err != nil {
		var pe *fs.PathError
		if errors.As(err, &pe) {
			return pe.Err
		}
		return err
	}
	name := f.Name()
	_ = f.Close()
	return os.Remove(name)
}

// canonical returns the absolute path of p with the symbolic links of its
// directory followed, for comparing paths that may not exist yet.
func canonical(p string) string {
	abs, err := filepath.Abs(p)
	if err != nil {
		return filepath.Clean(p)
	}
	if r, err := filepath.EvalSymlinks(abs); err == nil {
		return r
	}
	dir, base := filepath.Split(abs)
	if r, err := filepath.EvalSymlinks(dir); err == nil {
		return filepath.Join(r, base)
	}
	return abs
}

// same reports whether d writes the file at path (an input).
func same(d destination, path string) bool {
	if d.kind == toStdout {
		return path == Stdout
	}
	if fi, err := os.Stat(path); err == nil && d.info != nil && os.SameFile(fi, d.info) {
		return true
	}
	return canonical(d.target) == canonical(path)
}

// sameDest reports whether two file destinations are the same file.
func sameDest(a, b destination) bool {
	if a.info != nil && b.info != nil && os.SameFile(a.info, b.info) {
		return true
	}
	return canonical(a.target) == canonical(b.target)
}

// WriteFiles writes the outputs of one run, all or none. It checks them
// as [CheckOutputs] does, writes every file to a temporary file in its
// target's directory (a hidden name starting with "." and the base name),
// and renames the temporaries over their targets only when every one was
// written, flushed and synced; then it writes standard output (stdout) and
// named pipes. On any error, including a panic in a write function or
// SIGINT, SIGTERM or SIGHUP during the writing, the temporaries are
// removed and the targets are left as they were (on a signal the signal is
// then delivered again, so the program ends as it would have).
//
// Errors name the output's label and path and wrap the error of its write
// function or of the file system.
//
// WriteFiles panics if an output has a nil Write (programmer misuse).
func WriteFiles(outs []Output, ins []Input, stdout io.Writer) error {
	for _, o := range outs {
		if o.Write == nil {
			panic("export: WriteFiles with a nil write function for " + o.Label)
		}
	}
	dests, err := checkAll(outs, ins)
	if err != nil {
		return err
	}
	stop := watchSignals()
	defer stop()
	var temps []string // per destination; "" when not a file
	defer func() {
		for _, t := range temps {
			if t != "" {
				untrack(t)
				_ = os.Remove(t) // gone after a rename; discarded otherwise
			}
		}
	}()
	for _, d := range dests {
		tmp := ""
		if d.kind == toFile {
			if tmp, err = writeTemp(d); err != nil {
				return err
			}
		}
		temps = append(temps, tmp)
	}
	// pipes are opened before any file is put in place, without waiting:
	// one that no process reads fails now, not after (or never)
	pipes := make([]*os.File, len(dests))
	defer func() {
		for _, f := range pipes {
			if f != nil {
				_ = f.Close()
			}
		}
	}()
	for i, d := range dests {
		if d.kind == toPipe {
			if pipes[i], err = openPipe(d); err != nil {
				return err
			}
		}
	}
	for i, d := range dests {
		if temps[i] == "" {
			continue
		}
		if err := os.Rename(temps[i], d.target); err != nil {
			return fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err)
		}
		untrack(temps[i])
		temps[i] = ""
		syncDir(filepath.Dir(d.target))
	}
	for i, d := range dests {
		switch d.kind {
		case toStdout:
			if stdout == nil {
				return destError(ErrNotRegular, "%s - (standard output) is not available here; give a file name", d.Label)
			}
			if err := writeStream(d, stdout); err != nil {
				return err
			}
		case toPipe:
			f := pipes[i]
			pipes[i] = nil
			err := writeStream(d, f)
			if cerr := f.Close(); err == nil && cerr != nil {
				err = fmt.Errorf("writing %s %s: %w", d.Label, d.Path, cerr)
			}
			if err != nil {
				return err
			}
		}
	}
	return nil
}

// openPipe opens the pipe of d for writing without waiting for a reader
// (O_NONBLOCK: ENXIO when there is none), then makes writes wait for the
// reader as usual.
func openPipe(d destination) (*os.File, error) {
	fd, err := syscall.Open(d.target, syscall.O_WRONLY|syscall.O_NONBLOCK|syscall.O_CLOEXEC, 0)
	if errors.Is(err, syscall.ENXIO) {
		return nil, destError(ErrNoReader, "%s %s is a pipe that nothing reads: start its reader first (or give a file name)", d.Label, d.Path)
	}
	if err != nil {
		return nil, fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err)
	}
	if err := syscall.SetNonblock(fd, false); err != nil {
		_ = syscall.Close(fd)
		return nil, fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err)
	}
	return os.NewFile(uintptr(fd), d.target), nil
}

// writeStream writes d's content to w through a buffer.
func writeStream(d destination, w io.Writer) error {
	bw := bufio.NewWriter(w)
	if err := d.Write(bw); err != nil {
		return fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err)
	}
	if err := bw.Flush(); err != nil {
		return fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err)
	}
	return nil
}

// writeTemp writes d's content to a new temporary file next to its target
// and returns its name; on an error the temporary is removed.
func writeTemp(d destination) (string, error) {
	wrap := func(err error) error { return fmt.Errorf("writing %s %s: %w", d.Label, d.Path, err) }
	f, err := os.CreateTemp(filepath.Dir(d.target), "."+filepath.Base(d.target)+".tmp-*")
	if err != nil {
		return "", wrap(err)
	}
	name := f.Name()
	if err := track(name); err != nil {
		_ = f.Close()
		_ = os.Remove(name)
		return "", wrap(err)
	}
	ok := false
	defer func() {
		if !ok {
			_ = f.Close() // may already be closed; the file is discarded anyway
			untrack(name)
			_ = os.Remove(name)
		}
	}()
	bw := bufio.NewWriter(f)
	if err := d.Write(bw); err != nil {
		return "", wrap(err)
	}
	for _, step := range []func() error{bw.Flush, func() error { return f.Chmod(d.mode) }, f.Sync, f.Close} {
		if err := step(); err != nil {
			return "", wrap(err)
		}
	}
	ok = true
	return name, nil
}

// WriteFile writes one file atomically, as [WriteFiles] does with one
// output labelled with its path and no inputs: through a temporary file
// renamed over path only if writing, flushing and syncing succeeded, so
// that on any error (a panic in write included) path is left as it was. A
// new file gets mode 0644, a replaced one keeps its mode; a symbolic link
// is kept and its target written; a directory, a device other than the
// null device or a socket is refused (wrapping [ErrNotRegular]), and "-"
// is refused too, for want of a standard output.
//
// It returns [ErrNoPath] for an empty path, and otherwise wraps the error of
// write or of the file system with the path (a missing directory gives an
// error wrapping fs.ErrNotExist).
//
// WriteFile panics if write is nil (programmer misuse).
func WriteFile(path string, write func(io.Writer) error) error {
	if write == nil {
		panic("export: WriteFile with a nil write function")
	}
	if path == "" {
		return ErrNoPath
	}
	return WriteFiles([]Output{{Label: "file", Path: path, Write: write}}, nil, nil)
}

// syncDir flushes the directory entry of a rename to disk. Errors are
// ignored: the file is complete and in place, and some systems cannot sync
// a directory.
func syncDir(dir string) {
	d, err := os.Open(dir)
	if err != nil {
		return
	}
	_ = d.Sync()
	_ = d.Close()
}

// The temporary files being written, removed on a signal.
var (
	tempsMu     sync.Mutex
	tempFiles   = map[string]bool{}
	interrupted bool
	// raise delivers sig to the process again after the temporaries are
	// removed; tests replace it.
	raise = func(sig os.Signal) {
		if p, err := os.FindProcess(os.Getpid()); err == nil {
			_ = p.Signal(sig)
		}
	}
)

// errInterrupted is returned when a signal came during the writing.
var errInterrupted = errors.New("interrupted by a signal")

func track(name string) error {
	tempsMu.Lock()
	defer tempsMu.Unlock()
	if interrupted {
		return errInterrupted
	}
	tempFiles[name] = true
	return nil
}

func untrack(name string) {
	tempsMu.Lock()
	delete(tempFiles, name)
	tempsMu.Unlock()
}

// watchSignals removes the temporaries on SIGINT, SIGTERM or SIGHUP and
// delivers the signal again; the returned function stops watching.
func watchSignals() (stop func()) {
	tempsMu.Lock()
	interrupted = false
	tempsMu.Unlock()
	ch := make(chan os.Signal, 1)
	signal.Notify(ch, os.Interrupt, syscall.SIGTERM, syscall.SIGHUP)
	done := make(chan struct{})
	var wg sync.WaitGroup
	wg.Add(1)
	go func() {
		defer wg.Done()
		select {
		case sig := <-ch:
			tempsMu.Lock()
			interrupted = true
			for name := range tempFiles {
				_ = os.Remove(name)
				delete(tempFiles, name)
			}
			tempsMu.Unlock()
			signal.Stop(ch)
			raise(sig)
		case <-done:
		}
	}()
	return func() {
		signal.Stop(ch)
		close(done)
		wg.Wait()
	}
}
