// The plan editor's history of changes. A change is a command with forward() and backward(), each
// sending one request; commands run one after another in the order asked, so that changes reach the
// server in order. A change that the server stored is one undo step, also when its analysis is
// still pending; a change the server refused leaves the history as it was.

export class EditHistory {
  /**
   * run(step, kind) sends one step (a function returning the server's answer), shows the answer
   * and resolves true when it was stored, false when it was refused; kind is 'saved', 'undone' or
   * 'redone'. onChange() is called whenever canUndo or canRedo may have changed.
   */
  constructor(run, onChange = () => {}) {
    this.run = run;
    this.onChange = onChange;
    this.undoStack = [];
    this.redoStack = [];
    this.queue = Promise.resolve();
  }

  get canUndo() {
    return this.undoStack.length > 0;
  }

  get canRedo() {
    return this.redoStack.length > 0;
  }

  /** Runs a task after every task asked before it; the answer is the task's. */
  enqueue(task) {
    const next = this.queue.then(task, task);
    this.queue = next.catch(() => {});
    return next;
  }

  /** Sends a new change; once stored it is the newest undo step and nothing can be redone. */
  perform(command) {
    return this.enqueue(async () => {
      if (await this.run(() => command.forward(), 'saved')) {
        this.undoStack.push(command);
        this.redoStack.length = 0;
      }
      this.onChange();
    });
  }

  /** Takes back the newest stored change; two quick undos take back two changes. */
  undo() {
    const command = this.undoStack.pop();
    if (!command) {
      return this.queue;
    }
    this.onChange();
    return this.enqueue(async () => {
      if (await this.run(() => command.backward(), 'undone')) {
        this.redoStack.push(command);
      } else {
        this.undoStack.push(command);
      }
      this.onChange();
    });
  }

  /** Sends again the change taken back last. */
  redo() {
    const command = this.redoStack.pop();
    if (!command) {
      return this.queue;
    }
    this.onChange();
    return this.enqueue(async () => {
      if (await this.run(() => command.forward(), 'redone')) {
        this.undoStack.push(command);
      } else {
        this.redoStack.push(command);
      }
      this.onChange();
    });
  }
}

/** Ctrl+Z (or Cmd+Z) asks undo, Ctrl+Y and Ctrl+Shift+Z redo; null for other keys or while typing in a field. */
export function historyKey(event) {
  const tag = event.target && event.target.tagName;
  const typing = tag === 'INPUT' || tag === 'TEXTAREA' || tag === 'SELECT';
  if (!(event.ctrlKey || event.metaKey) || typing) {
    return null;
  }
  const key = event.key.toLowerCase();
  if (key === 'z' && !event.shiftKey) {
    return 'undo';
  }
  if (key === 'y' || (key === 'z' && event.shiftKey)) {
    return 'redo';
  }
  return null;
}
