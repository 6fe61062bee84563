;; Runs the README's eglot snippet (MOTORLANG_SNIPPET, loaded as a user's init would be), opens a motor
;; list, and writes what it saw, one fact per line, to MOTORLANG_OUT. `motorlang' is found on PATH.
;; Debian 12's Emacs 28 has eglot from the elpa-eglot package; Emacs 29 and later have it built in.
(require 'package)
(add-to-list (quote package-directory-list) "/usr/share/emacs/site-lisp/elpa")
(package-initialize)
(defvar motorlang-out '())
(defun motorlang-say (line) (push line motorlang-out))
(condition-case err
    (progn (load (getenv "MOTORLANG_SNIPPET") nil t) (motorlang-say "snippet-loaded t"))
  (error (motorlang-say (format "snippet-loaded nil %S" err))))
;; Opening the file autoloads eglot through the snippet's hook, as in a user's session.
(find-file (getenv "MOTORLANG_FILE"))
;; eglot-ensure connects after the next command; a batch Emacs runs no commands, so run the hook once.
(run-hooks (quote post-command-hook))
(require 'flymake)
(motorlang-say (format "mode %s" major-mode))
(motorlang-say (format "indent-tabs-mode %s tab-width %d" indent-tabs-mode tab-width))
(let ((deadline (+ (float-time) 90)))
  (while (and (< (float-time) deadline) (null (flymake-diagnostics)))
    (accept-process-output nil 0.1)))
(motorlang-say (format "eglot-managed %s" (and (eglot-current-server) t)))
(dolist (d (sort (flymake-diagnostics) (lambda (a b) (< (flymake-diagnostic-beg a) (flymake-diagnostic-beg b)))))
  (save-excursion
    (goto-char (flymake-diagnostic-beg d))
    (motorlang-say (format "diagnostic %d:%d %s" (line-number-at-pos) (1+ (current-column)) (flymake-diagnostic-text d)))))
;; A hover on SAW-1's wire line (0-based line 17, column 6), as M-x eldoc would ask for it.
(let* ((uri (concat "file://" (expand-file-name (getenv "MOTORLANG_FILE"))))
       (hover (ignore-errors
                (jsonrpc-request (eglot-current-server) :textDocument/hover
                                 (list :textDocument (list :uri uri) :position (list :line 17 :character 6)))))
       (contents (and hover (plist-get hover :contents))))
  (motorlang-say (format "hover %s" (replace-regexp-in-string "\n" " " (format "%s" (if (listp contents) (plist-get contents :value) contents))))))
(with-temp-file (getenv "MOTORLANG_OUT")
  (insert (mapconcat #'identity (reverse motorlang-out) "\n") "\n"))
(ignore-errors (eglot-shutdown (eglot-current-server)))
(kill-emacs 0)
