package gui

// cause says where a change of the review came from, so that a panel
// can tell a design loaded from a file from a keystroke on the form.
type cause int

// Causes of a change.
const (
	// causeOpened: a document was opened (a design file, the example, a
	// new design, recovered work); everything changed.
	causeOpened cause = iota
	// causeRevision: a kept revision was opened in the form; the working
	// copy was replaced.
	causeRevision
	// causeTyped: the reviewer typed into the field named; its entry
	// shows the text already.
	causeTyped
	// causeChosen: the reviewer set the field named, or every field
	// below it, by a choice (a selector, a preset, a button); every
	// widget that shows it is redrawn.
	causeChosen
	// causeKept: the working copy was kept as a new revision.
	causeKept
	// causeSaved: the design file was saved; its path and name may have
	// changed.
	causeSaved
	// causeUnits: the window shows another unit system; the document is
	// unchanged.
	causeUnits
	// causeLibrary: the fluid library changed.
	causeLibrary
	// causeResults: the results of the working copy changed: a new
	// assessment, or an input refused.
	causeResults
	// causeStudied: a tolerance study of the working copy finished; the
	// document holds it (document.studyFor).
	causeStudied
	// causeStop: the window stops its background work (it closes, or a
	// test brings it to rest); a panel running work of its own cancels
	// it. The document is unchanged.
	causeStop
)

// edit reports whether the cause is an edit of the working copy or the
// product by the reviewer.
func (c cause) edit() bool { return c == causeTyped || c == causeChosen }

// reload reports whether every panel shows the document afresh.
func (c cause) reload() bool { return c == causeOpened || c == causeRevision || c == causeUnits }

// change is one change of the review, as the panels are told of it.
type change struct {
	cause cause
	// field is the path (hazards.Field…) of the input that changed, or
	// of the group whose inputs all changed (hazards.FieldRoom, …);
	// fieldProduct for the product's description; "" when the change is
	// not one of the reviewer's edits.
	field string
}

// fieldProduct names the product's name, part number, company and
// description in a change: they belong to the design file, not to a
// design.
const fieldProduct = "product"

// feed hands every change of the review to the panels that subscribed,
// in the order they subscribed. A change published while another is
// being handed out waits until that one has reached every subscriber, so
// that each sees the changes in the order they happened.
type feed struct {
	subs    []func(change)
	queue   []change
	running bool
}

// subscribe adds fn to the subscribers.
func (f *feed) subscribe(fn func(change)) { f.subs = append(f.subs, fn) }

// publish hands c to every subscriber; a nil feed drops it.
func (f *feed) publish(c change) {
	if f == nil {
		return
	}
	f.queue = append(f.queue, c)
	if f.running {
		return
	}
	f.running = true
	defer func() { f.running = false }()
	for len(f.queue) > 0 {
		next := f.queue[0]
		f.queue = f.queue[1:]
		for _, fn := range f.subs {
			fn(next)
		}
	}
}
