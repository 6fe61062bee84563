-- Drives Neovim's built-in LSP client against `motorlang lsp` (Neovim 0.7 API: start_client/buf_attach_client).
-- Reads its inputs from the environment and writes what it saw, one fact per line, to MOTORLANG_OUT.
local out = {}
local function say(line) table.insert(out, line) end

vim.cmd("edit " .. vim.fn.fnameescape(vim.env.MOTORLANG_FILE))
local buf = vim.api.nvim_get_current_buf()
local client_id = vim.lsp.start_client({
  name = "motorlang",
  cmd = { "dotnet", vim.env.MOTORLANG_DLL, "lsp", "--debounce-ms", "0" },
  root_dir = vim.fn.fnamemodify(vim.env.MOTORLANG_FILE, ":h"),
})
vim.lsp.buf_attach_client(buf, client_id)

local got = vim.wait(60000, function() return #vim.diagnostic.get(buf) > 0 end, 50)
say("diagnostics-arrived " .. tostring(got))
for _, d in ipairs(vim.diagnostic.get(buf)) do
  say(string.format("diagnostic %d:%d %s %s", d.lnum + 1, d.col + 1, tostring(d.code), d.message))
end

local client = vim.lsp.get_client_by_id(client_id)
local params = {
  textDocument = { uri = vim.uri_from_bufnr(buf) },
  position = { line = tonumber(vim.env.MOTORLANG_HOVER_LINE), character = tonumber(vim.env.MOTORLANG_HOVER_COL) },
}
local response = client.request_sync("textDocument/hover", params, 30000, buf)
if response and response.result then
  say("hover " .. response.result.contents.value:gsub("\n", " "))
else
  say("hover none " .. vim.inspect(response))
end

vim.fn.writefile(out, vim.env.MOTORLANG_OUT)
client.stop()
vim.wait(5000, function() return client.is_stopped() end, 50)
vim.cmd("qa!")
