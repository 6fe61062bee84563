-- Runs the README's Neovim snippet (MOTORLANG_SNIPPET, loaded as a user's init would be) and then
-- opens two motor lists of one folder the way a user does. Writes what it saw, one fact per line,
-- to MOTORLANG_OUT. `motorlang` is found on PATH, as the snippet expects.
local out = {}
local function say(line) table.insert(out, line) end

local ok, err = pcall(dofile, vim.env.MOTORLANG_SNIPPET)
say("snippet-loaded " .. tostring(ok) .. (ok and "" or (" " .. tostring(err))))

vim.cmd("edit " .. vim.fn.fnameescape(vim.env.MOTORLANG_FILE))
local buf = vim.api.nvim_get_current_buf()
say("filetype " .. vim.bo[buf].filetype)
say(string.format("indent expandtab=%s shiftwidth=%d softtabstop=%d", tostring(vim.bo[buf].expandtab), vim.bo[buf].shiftwidth, vim.bo[buf].softtabstop))

local got = vim.wait(60000, function() return #vim.diagnostic.get(buf) > 0 end, 50)
say("diagnostics-arrived " .. tostring(got))
for _, d in ipairs(vim.diagnostic.get(buf)) do
  say(string.format("diagnostic %d:%d %s %s", d.lnum + 1, d.col + 1, tostring(d.code), d.message))
end

-- A second list of the same folder is served by the same client.
vim.cmd("edit " .. vim.fn.fnameescape(vim.env.MOTORLANG_SECOND))
local second = vim.api.nvim_get_current_buf()
vim.wait(60000, function() return #vim.diagnostic.get(second) > 0 end, 50)
local ids = {}
for _, b in ipairs({ buf, second }) do
  for id, _ in pairs(vim.lsp.buf_get_clients(b)) do ids[id] = true end
end
local count = 0
for _ in pairs(ids) do count = count + 1 end
say("clients " .. count)
say("second-diagnostics " .. #vim.diagnostic.get(second))

vim.fn.writefile(out, vim.env.MOTORLANG_OUT)
for _, client in pairs(vim.lsp.get_active_clients()) do client.stop() end
vim.wait(5000, function() return #vim.lsp.get_active_clients() == 0 end, 50)
vim.cmd("qa!")
